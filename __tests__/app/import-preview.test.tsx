import { fireEvent, render, screen, within } from '@testing-library/react-native';
import { CommitPanel } from '@/components/imports/commit-panel';
import { ImportPreview } from '@/components/imports/import-preview';
import type { ImportPreviewDto, ImportRowDto } from '@/lib/contracts/imports';

const row = (line: number, over: Partial<ImportRowDto> = {}): ImportRowDto => ({
  line,
  specId: null,
  make: 'Testmake',
  model: 'Alpha 500',
  yearFrom: 2010,
  yearTo: 2014,
  variant: 'EU',
  component: 'ignition coil',
  parameter: 'primary winding resistance',
  display: '2.4–3.2 Ω',
  warnings: [],
  ...over,
});

const preview = (over: Partial<ImportPreviewDto> = {}): ImportPreviewDto => ({
  id: 12,
  fileName: 'coils.csv',
  sha256: 'ab',
  fileSize: 400,
  status: 'previewed',
  counts: { created: 1, updated: 1, unchanged: 1, rejected: 2, warnings: 1 },
  uploaderName: 'Lead',
  createdAt: '2026-01-05T10:00:00Z',
  committedAt: null,
  committedByName: null,
  fileErrors: [],
  created: [
    row(2, {
      parameter: 'stator resistance',
      warnings: [{ line: 2, column: 'nominal', reason: 'nominal 45 is unusual' }],
    }),
  ],
  updated: [{ ...row(3, { specId: 40 }), changes: [{ field: 'max', before: 3.2, after: 3.5 }] }],
  unchanged: [row(4, { specId: 41, parameter: 'secondary winding resistance' })],
  rejected: [
    { line: 5, column: 'min', reason: 'min 4 is greater than max 3' },
    { line: 6, column: 'unit', reason: 'unit "furlong" is not recognised' },
  ],
  page: { offset: 0, limit: 200 },
  ...over,
});

describe('ImportPreview', () => {
  it('lists each rejected row with its line, column and the plain reason', () => {
    render(<ImportPreview preview={preview()} onOpenSpec={jest.fn()} onPage={jest.fn()} />);
    const rejected = within(screen.getByTestId('import-rejected'));
    expect(rejected.getByText('Line 5')).toBeTruthy();
    expect(rejected.getByText('Column min')).toBeTruthy();
    expect(rejected.getByText('min 4 is greater than max 3')).toBeTruthy();
    expect(rejected.getByText('Line 6')).toBeTruthy();
    expect(rejected.getByText('unit "furlong" is not recognised')).toBeTruthy();
  });

  it('shows an updated row field by field, before → after, with a link to its spec', () => {
    const onOpenSpec = jest.fn();
    render(<ImportPreview preview={preview()} onOpenSpec={onOpenSpec} onPage={jest.fn()} />);
    const changes = within(screen.getByTestId('import-changes-3'));
    expect(changes.getByText('Maximum')).toBeTruthy();
    expect(screen.getByTestId('import-changes-3')).toHaveTextContent(/3\.2 → 3\.5/);
    fireEvent.press(screen.getByLabelText('Open the spec from line 3'));
    expect(onOpenSpec).toHaveBeenCalledWith(40);
  });

  it('keeps unchanged rows folded until asked, and lists warnings with their line', () => {
    render(<ImportPreview preview={preview()} onOpenSpec={jest.fn()} onPage={jest.fn()} />);
    expect(screen.queryByText(/secondary winding resistance/)).toBeNull();
    fireEvent.press(screen.getByTestId('toggle-unchanged'));
    expect(screen.getByText(/secondary winding resistance/)).toBeTruthy();
    expect(within(screen.getByTestId('import-warnings')).getByText('nominal 45 is unusual')).toBeTruthy();
  });
});

describe('CommitPanel', () => {
  it('when nothing would change, disables the commit button', () => {
    const p = preview({ counts: { created: 0, updated: 0, unchanged: 3, rejected: 1, warnings: 0 } });
    render(<CommitPanel preview={p} committing={false} error={null} onCommit={jest.fn()} onOpenSpec={jest.fn()} />);
    expect(screen.getByText(/Nothing to commit/)).toBeTruthy();
    expect(screen.getByTestId('commit-button')).toBeDisabled();
  });

  it('once committed, shows the counts and links to the specs instead of the button', () => {
    const p = preview({ status: 'committed', committedByName: 'Lead', created: [row(2, { specId: 77 })] });
    const onOpenSpec = jest.fn();
    render(<CommitPanel preview={p} committing={false} error={null} onCommit={jest.fn()} onOpenSpec={onOpenSpec} />);
    expect(screen.queryByTestId('commit-button')).toBeNull();
    expect(screen.getByTestId('commit-done')).toHaveTextContent(/1 spec created and 1 spec updated by Lead/);
    fireEvent.press(screen.getByTestId('committed-spec-77'));
    expect(onOpenSpec).toHaveBeenCalledWith(77);
  });
});
