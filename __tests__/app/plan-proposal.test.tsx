import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { PlanChangeView } from '@/components/corrections/plan-change-view';
import { PlanProposalForm } from '@/components/corrections/plan-proposal-form';
import type { PlanChangeDto } from '@/lib/contracts/corrections';

const BLANK = { title: '', edition: '', page: '', url: '', rationale: '' };

describe('PlanProposalForm', () => {
  it('when the source and the reason are missing, shows the schema’s messages and sends nothing', async () => {
    const onSubmit = jest.fn();
    render(
      <PlanProposalForm
        initialJson='{"title":"Weak spark"}'
        initial={BLANK}
        submitLabel="Send"
        pending={false}
        error={null}
        onSubmit={onSubmit}
      />,
    );

    fireEvent.press(screen.getByRole('button', { name: 'Send' }));

    expect(await screen.findByText('source title is required')).toBeTruthy();
    expect(screen.getByText('say why, in at least 10 characters')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('sends the edited plan JSON with the source and the reason', async () => {
    const onSubmit = jest.fn();
    render(
      <PlanProposalForm
        initialJson='{"title":"Weak spark"}'
        initial={{ ...BLANK, title: 'Invented notes', page: '4' }}
        submitLabel="Send"
        pending={false}
        error={null}
        onSubmit={onSubmit}
      />,
    );

    fireEvent.changeText(screen.getByTestId('plan-json'), '{"title":"No spark at all"}');
    fireEvent.changeText(screen.getByLabelText('Why should the plan change?'), 'The bulletin renames the plan.');
    fireEvent.press(screen.getByRole('button', { name: 'Send' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0][0]).toMatchObject({
      plan: { title: 'No spark at all' },
      citation: { title: 'Invented notes', page: '4' },
      rationale: 'The bulletin renames the plan.',
    });
  });
});

describe('PlanChangeView', () => {
  const plan: PlanChangeDto = {
    id: 3,
    title: 'Weak spark',
    proposed: {},
    changes: {
      added: [{ id: 'cap', title: 'Plug cap resistance' }],
      removed: [{ id: 'old', title: 'Old step' }],
      changed: [{ id: 'coil', title: 'Coil primary', fields: ['check', 'next'] }],
      reordered: false,
      planFields: ['citation'],
    },
    changesNow: null,
  };

  it('lists the steps added, removed and changed, with the changed fields in words', () => {
    render(<PlanChangeView plan={plan} baseVersion={2} currentVersion={2} />);

    expect(screen.getByText('• Plug cap resistance (cap)')).toBeTruthy();
    expect(screen.getByText('• Old step (old)')).toBeTruthy();
    expect(screen.getByText('• Coil primary (coil): check, where the outcomes lead')).toBeTruthy();
    expect(screen.getByText('Also changes the plan’s source.')).toBeTruthy();
    expect(screen.queryByTestId('plan-change-now')).toBeNull();
  });

  it('when the plan moved on, also says what accepting would change in the current version', () => {
    const changesNow = { ...plan.changes!, added: [], removed: [], changed: [] };
    render(<PlanChangeView plan={{ ...plan, changesNow }} baseVersion={2} currentVersion={3} />);

    expect(screen.getByText('What accepting would change in version 3')).toBeTruthy();
  });
});
