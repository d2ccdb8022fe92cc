import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { ProposalForm, type ProposalFields } from '@/components/corrections/proposal-form';
import { CorrectionCard } from '@/components/corrections/correction-card';
import type { CorrectionDto } from '@/lib/contracts/corrections';

const INITIAL: ProposalFields = {
  component: '',
  parameter: 'primary winding resistance',
  min: '0.4',
  nominal: '',
  max: '0.6',
  unit: 'Ω',
  refTempC: '20',
  testPoints: '',
  conditions: '',
  title: '',
  edition: '',
  page: '',
  url: '',
  rationale: '',
};
const TARGET = { kind: 'change', specId: 7, version: 3 } as const;

describe('ProposalForm', () => {
  it('when the source and the reason are missing, shows the schema’s messages under those fields', async () => {
    const onSubmit = jest.fn();
    render(
      <ProposalForm
        target={TARGET}
        initial={INITIAL}
        units={['Ω']}
        submitting={false}
        submitLabel="Send"
        onSubmit={onSubmit}
      />,
    );

    fireEvent.press(screen.getByRole('button', { name: 'Send' }));

    expect(await screen.findByText('source title is required')).toBeTruthy();
    expect(screen.getByText('source page is required')).toBeTruthy();
    expect(screen.getByText('say why, in at least 10 characters')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('sends the body as typed, a decimal comma read as a point', async () => {
    const onSubmit = jest.fn();
    render(
      <ProposalForm
        target={TARGET}
        initial={INITIAL}
        units={['Ω']}
        submitting={false}
        submitLabel="Send"
        onSubmit={onSubmit}
      />,
    );

    fireEvent.changeText(screen.getByLabelText('Maximum'), '0,7');
    fireEvent.changeText(screen.getByLabelText('Source title'), 'Invented Bulletin');
    fireEvent.changeText(screen.getByLabelText('Page'), '2');
    fireEvent.changeText(screen.getByLabelText('Why should it change?'), 'The bulletin widens the limit.');
    fireEvent.press(screen.getByRole('button', { name: 'Send' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    const body = onSubmit.mock.calls[0][0];
    expect(body).toMatchObject({ kind: 'change', specId: 7, version: 3, rationale: 'The bulletin widens the limit.' });
    expect(body.values).toMatchObject({ min: 0.4, max: 0.7, unit: 'Ω' });
    expect(body.citation).toMatchObject({ title: 'Invented Bulletin', page: '2' });
  });

  it('puts the server’s nested paths under the flat fields', async () => {
    render(
      <ProposalForm
        target={TARGET}
        initial={INITIAL}
        units={['Ω']}
        submitting={false}
        submitLabel="Send"
        serverErrors={[{ path: 'citation.page', message: 'source page: at most 40 characters' }]}
        onSubmit={jest.fn()}
      />,
    );

    const message = await screen.findByText('source page: at most 40 characters');
    expect(message.props.nativeID).toBe(screen.getByLabelText('Page').props['aria-describedby']);
  });
});

describe('CorrectionCard', () => {
  const c = {
    id: 12,
    kind: 'change',
    status: 'pending',
    modelTitle: 'Testmake Alpha 500',
    componentName: 'ignition coil',
    parameter: 'primary winding resistance',
    proposed: { min: 0.4, nominal: null, max: 0.7, unit: 'Ω', refTempC: 20, testPoints: '', conditions: '' },
    citation: { title: 'Invented Bulletin', edition: '', page: '2', url: null },
    rationale: 'The bulletin widens the limit.',
    proposer: { id: 3, name: 'Tamsin Reed', accepted: 2, rejected: 1 },
    decisionNote: null,
    reviewerName: null,
    createdAt: '2026-01-05T10:00:00Z',
  } as unknown as CorrectionDto;

  it('shows the proposer line only when asked (editors’ views)', () => {
    const { rerender } = render(<CorrectionCard c={c} />);
    expect(screen.queryByText(/^By Tamsin Reed/)).toBeNull();

    rerender(<CorrectionCard c={c} showProposer />);
    expect(screen.getByText('By Tamsin Reed · 2 accepted, 1 not accepted so far')).toBeTruthy();
  });
});
