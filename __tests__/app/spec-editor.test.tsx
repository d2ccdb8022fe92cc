import { fireEvent, render, screen, waitFor, within } from '@testing-library/react-native';
import { SpecCreateForm } from '@/components/spec-editor/spec-create-form';
import { SpecEditForm } from '@/components/spec-editor/spec-edit-form';
import { EMPTY_SPEC_FORM, specToForm, toUpdateBody } from '@/components/spec-editor/spec-form-values';
import { StaleEditView } from '@/components/spec-editor/stale-edit-view';
import type { SpecDetailDto } from '@/lib/contracts/library';

const spec = (over: Partial<SpecDetailDto> = {}): SpecDetailDto => ({
  id: 9,
  componentId: 3,
  parameter: 'primary winding resistance',
  quantityKind: 'resistance',
  min: 2.4,
  nominal: 2.8,
  max: 3.2,
  unit: 'Ω',
  mode: null,
  nearLimit: null,
  engineRpm: null,
  refTempC: 20,
  material: 'copper',
  status: 'published',
  version: 4,
  display: '2.4–3.2 Ω',
  testPoints: 'orange/white to ground',
  conditions: 'engine cold',
  notes: null,
  sourcePage: '7-12',
  source: {
    id: 1,
    title: 'Invented Manual',
    edition: '3rd',
    publisher: null,
    year: null,
    kind: 'service_manual',
    url: null,
  },
  component: { id: 3, name: 'ignition coil', locationNotes: null, connectorNotes: null },
  model: { id: 2, make: { id: 1, name: 'Testmake' }, name: 'Alpha 500', yearFrom: 2010, yearTo: 2014, variant: 'EU' },
  updatedAt: '2026-01-05T10:00:00Z',
  revisions: [
    {
      id: 30,
      version: 4,
      changedFields: ['max'],
      authorName: 'Other Editor',
      reason: 'SB-12 widens the limit',
      origin: 'edit',
      originRef: null,
      createdAt: '2026-01-05T10:00:00Z',
      snapshot: {},
    },
  ],
  ...over,
});

describe('toUpdateBody', () => {
  it('sends only the changed fields, with the version and the reason', () => {
    const base = specToForm(spec());
    const body = toUpdateBody(base, { ...base, max: '3,5', notes: 'Re-measured', reason: 'SB-31' }, 4);
    expect(body).toEqual({ max: 3.5, notes: 'Re-measured', version: 4, reason: 'SB-31' });
  });

  it('sends the whole source when one of its fields changes', () => {
    const base = specToForm(spec());
    expect(toUpdateBody(base, { ...base, source: { ...base.source, page: '7-13' }, reason: 'page' }, 4)).toEqual({
      source: { title: 'Invented Manual', edition: '3rd', page: '7-13', url: null },
      version: 4,
      reason: 'page',
    });
  });
});

describe('StaleEditView', () => {
  it('shows the current values and the editor’s own side by side, and re-applies on request', () => {
    // Loaded at version 3 with max 3.2; someone saved max 3.4 (version 4); this editor typed max 3.5.
    const base = specToForm(spec({ version: 3 }));
    const onReapply = jest.fn();
    render(
      <StaleEditView
        current={spec({ max: 3.4 })}
        base={base}
        baseVersion={3}
        mine={{ ...base, max: '3.5' }}
        changed={['max']}
        busy={false}
        onReapply={onReapply}
        onEditMine={jest.fn()}
        onDiscard={jest.fn()}
      />,
    );
    expect(
      screen.getByText(/You started from version 3; it is now at version 4 \(Other Editor: “SB-12 widens the limit”\)/),
    ).toBeTruthy();
    const row = within(screen.getByTestId('stale-row-max'));
    expect(row.getByText('3.4')).toBeTruthy();
    expect(row.getByText('3.5')).toBeTruthy();
    expect(row.getByText('both changed')).toBeTruthy();
    fireEvent.press(screen.getByTestId('stale-reapply'));
    expect(onReapply).toHaveBeenCalled();
  });
});

const VALID = {
  ...EMPTY_SPEC_FORM,
  make: 'Testmake',
  model: 'Alpha 500',
  yearFrom: '2010',
  component: 'stator',
  parameter: 'stator winding resistance',
  min: '0,2',
  max: '0.4',
  source: { title: 'Invented Manual', edition: '', page: '4-2', url: '' },
};

describe('SpecCreateForm', () => {
  it('checks the typed values with the server’s schema and shows each message under its field', async () => {
    const onSubmit = jest.fn();
    render(<SpecCreateForm submitting={false} onSubmit={onSubmit} initial={EMPTY_SPEC_FORM} />);
    fireEvent.press(screen.getByTestId('spec-create-submit'));
    await waitFor(() => expect(screen.getByText('make is required')).toBeTruthy());
    expect(screen.getByText('Year from must be a year')).toBeTruthy();
    expect(screen.getByText('source title is required')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('once each field is valid, reports the rules between fields (min above max) under min', async () => {
    const onSubmit = jest.fn();
    render(<SpecCreateForm submitting={false} onSubmit={onSubmit} initial={{ ...VALID, min: '5', max: '3' }} />);
    fireEvent.press(screen.getByTestId('spec-create-submit'));
    await waitFor(() => expect(screen.getByText('min 5 is greater than max 3')).toBeTruthy());
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('sends the parsed body when the values are valid', async () => {
    const onSubmit = jest.fn();
    render(<SpecCreateForm submitting={false} onSubmit={onSubmit} initial={VALID} />);
    fireEvent.press(screen.getByTestId('spec-create-submit'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0][0]).toMatchObject({
      make: 'Testmake',
      yearFrom: 2010,
      yearTo: null,
      min: 0.2,
      max: 0.4,
      unit: 'Ω',
      source: { page: '4-2', url: null },
    });
  });
});

describe('SpecEditForm', () => {
  it('when nothing changed, says so instead of sending', async () => {
    const onSubmit = jest.fn();
    const base = specToForm(spec());
    render(
      <SpecEditForm
        base={base}
        version={4}
        initial={{ ...base, reason: 'no change' }}
        submitting={false}
        onSubmit={onSubmit}
      />,
    );
    fireEvent.press(screen.getByTestId('spec-edit-submit'));
    await waitFor(() => expect(screen.getByText('Change at least one field before saving.')).toBeTruthy());
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('sends the changed field with the version it was based on', async () => {
    const onSubmit = jest.fn();
    const base = specToForm(spec());
    render(<SpecEditForm base={base} version={4} submitting={false} onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByLabelText('Maximum'), '3.6');
    fireEvent.changeText(screen.getByLabelText('Why does it change? (required)'), 'SB-40');
    fireEvent.press(screen.getByTestId('spec-edit-submit'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0][0]).toEqual({ max: 3.6, version: 4, reason: 'SB-40' });
  });
});
