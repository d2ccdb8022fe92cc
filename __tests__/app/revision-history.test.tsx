import { fireEvent, render, screen } from '@testing-library/react-native';
import { RevertForm } from '@/components/history/revert-form';
import { originText } from '@/components/history/revision-item';
import { ApiError } from '@/lib/api/client';
import type { RevisionDiffDto } from '@/lib/contracts/curation';

const revision = (over: Partial<RevisionDiffDto>): RevisionDiffDto => ({
  id: 50,
  version: 2,
  origin: 'edit',
  originRef: null,
  authorName: 'Lead',
  reason: 'SB-9',
  createdAt: '2026-01-05T10:00:00Z',
  changedFields: ['max'],
  changes: [{ field: 'max', before: 3.2, after: 3.4 }],
  snapshot: { min: 2.4, max: 3.4, unit: 'Ω' },
  ...over,
});

describe('originText', () => {
  it('names the batch of an import and the version a revert went back to', () => {
    const target = revision({ id: 50, version: 2 });
    expect(originText(revision({ origin: 'import', originRef: 'batch #7' }), [])).toBe('Imported (batch #7)');
    expect(originText(revision({ version: 4, origin: 'revert', originRef: 'revision #50' }), [target])).toBe(
      'Reverted (to version 2)',
    );
    expect(originText(revision({ version: 1, changedFields: ['created'] }), [])).toBe('Created');
  });
});

describe('RevertForm', () => {
  it('shows what the revert changes and needs a reason before it sends', () => {
    const onSubmit = jest.fn();
    render(
      <RevertForm
        revision={revision({})}
        now={{ min: 2.4, max: 3.6, unit: 'Ω' }}
        version={3}
        busy={false}
        error={null}
        onSubmit={onSubmit}
        onCancel={jest.fn()}
      />,
    );
    expect(screen.getByText('Maximum')).toBeTruthy();
    expect(screen.getByTestId('revert-confirm')).toBeDisabled();
    fireEvent.changeText(screen.getByLabelText('Why revert? (required)'), 'SB-9 was withdrawn');
    fireEvent.press(screen.getByTestId('revert-confirm'));
    expect(onSubmit).toHaveBeenCalledWith('SB-9 was withdrawn', 3);
  });

  it('on a stale version, warns and offers to revert on the current version', () => {
    const current = {
      id: 9,
      version: 5,
      parameter: 'p',
      min: 2.4,
      nominal: null,
      max: 3.8,
      unit: 'Ω',
      refTempC: null,
      material: 'copper',
      status: 'published',
      testPoints: null,
      conditions: null,
      notes: null,
      sourcePage: null,
      source: null,
      revisions: [],
    };
    const error = new ApiError(409, 'conflict', 'Spec 9 has changed since version 3.', [], { current });
    const onSubmit = jest.fn();
    render(
      <RevertForm
        revision={revision({})}
        now={{}}
        version={3}
        busy={false}
        error={error}
        onSubmit={onSubmit}
        onCancel={jest.fn()}
      />,
    );
    expect(screen.getByText(/It is now at version 5, not 3/)).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Why revert? (required)'), 'SB-9 was withdrawn');
    fireEvent.press(screen.getByLabelText('Revert on version 5'));
    expect(onSubmit).toHaveBeenCalledWith('SB-9 was withdrawn', 5);
  });
});
