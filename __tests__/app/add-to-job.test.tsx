import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { AddToJob } from '@/components/jobs/add-to-job';
import { evaluateReading, type VerdictInput } from '@/lib/verdict';

const mockAdd = jest.fn();
let mockQueuedJobs: { id: number; status: 'open'; machineLabel: string; modelTitle: null }[] = [];
jest.mock('expo-router', () => ({ useRouter: () => ({ push: jest.fn(), dismissTo: jest.fn() }) }));
jest.mock('@/lib/session/session-provider', () => ({
  useSession: () => ({ status: 'signed-in', user: { id: 7, displayName: 'Dana' } }),
}));
jest.mock('@/lib/hooks/use-reading-queue', () => ({
  useReadingQueue: () => ({
    add: mockAdd,
    fate: () => ({ status: 'waiting' }),
    queuedJobs: mockQueuedJobs,
    sentJobId: () => null,
  }),
}));
jest.mock('@/lib/api/jobs', () => ({
  listJobs: jest.fn(async () => [{ id: 5, status: 'open', machineLabel: 'Blue quad', modelTitle: null }]),
  getJob: jest.fn(async () => ({ id: 5, readings: [] })),
}));

const INPUT: VerdictInput = {
  spec: { min: 0.2, nominal: null, max: 0.6, unit: 'Ω', refTempC: null, material: 'none' },
  reading: { value: 0.4, unit: 'Ω' },
} as VerdictInput;
const DRAFT = { kind: 'measured' as const, input: INPUT };
const VERDICT = evaluateReading(INPUT).verdict;

function wrapper({ children }: { children: ReactNode }) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity } } });
  return <QueryClientProvider client={qc}>{children}</QueryClientProvider>;
}

beforeEach(() => {
  mockQueuedJobs = [];
  mockAdd.mockReset().mockResolvedValue({ status: 'queued', key: 'k' });
});

describe('AddToJob', () => {
  it('on a spec card, sends the reading by spec id to the job and re-take the screen passed', async () => {
    const spec = { id: 31, modelId: 2, parameter: 'stator winding resistance', componentName: 'stator' };
    render(<AddToJob draft={DRAFT} verdict={VERDICT} spec={spec} jobId={5} retakeOf={88} />, { wrapper });

    expect(screen.getByTestId('add-to-job-retake')).toBeTruthy();
    expect(screen.queryByLabelText('What did you measure?')).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Add to job #5' }));

    await waitFor(() => expect(mockAdd).toHaveBeenCalled());
    const sent = mockAdd.mock.calls[0][0];
    expect(sent.jobId).toBe(5);
    expect(sent.body).toMatchObject({ specId: 31, retakeOf: 88, reading: { value: 0.4, unit: 'Ω' } });
    expect(sent.preview).toMatchObject({ label: 'stator winding resistance', componentName: 'stator' });
    expect(await screen.findByText('Queued — will send when online')).toBeTruthy();
  });

  it('with limits typed by hand, asks what was measured before sending, then sends the label', async () => {
    render(<AddToJob draft={DRAFT} verdict={VERDICT} jobId={5} />, { wrapper });

    fireEvent.press(screen.getByRole('button', { name: 'Add to job #5' }));
    expect(await screen.findByText('Say what you measured, e.g. “stator, yellow to yellow”.')).toBeTruthy();
    expect(mockAdd).not.toHaveBeenCalled();

    fireEvent.changeText(screen.getByLabelText('What did you measure?'), 'Plug gap, rear');
    fireEvent.press(screen.getByRole('button', { name: 'Add to job #5' }));

    await waitFor(() => expect(mockAdd).toHaveBeenCalled());
    expect(mockAdd.mock.calls[0][0].body).toMatchObject({ label: 'Plug gap, rear', spec: { min: 0.2, max: 0.6 } });
  });

  it("a beep-only diode check goes as a check with the technician's label, and its preview is in words", async () => {
    const draft = {
      kind: 'check' as const,
      check: { kind: 'diode' as const, forward: 'conducts' as const, reverse: 'open' as const },
    };
    render(<AddToJob draft={draft} verdict="pass" jobId={5} />, { wrapper });

    fireEvent.changeText(screen.getByLabelText('What did you measure?'), 'Rectifier diode D1');
    fireEvent.press(screen.getByRole('button', { name: 'Add to job #5' }));

    await waitFor(() => expect(mockAdd).toHaveBeenCalled());
    const sent = mockAdd.mock.calls[0][0];
    expect(sent.body).toEqual({
      label: 'Rectifier diode D1',
      check: { kind: 'diode', forward: 'conducts', reverse: 'open' },
    });
    expect(sent.preview).toMatchObject({ text: 'Forward conducts, reverse open', verdict: 'pass' });
  });

  it('a job started offline and not sent yet is offered first, without a number, and takes the reading', async () => {
    mockQueuedJobs = [{ id: -1, status: 'open', machineLabel: 'Green trail bike', modelTitle: null }];
    render(<AddToJob draft={DRAFT} verdict={VERDICT} />, { wrapper });
    fireEvent.changeText(screen.getByLabelText('What did you measure?'), 'Stator, yellow to yellow');
    fireEvent.press(screen.getByRole('button', { name: 'Add to job' }));
    const local = await screen.findByRole('button', { name: 'Add to the new job (not sent yet): Green trail bike' });
    expect(screen.getByText('New, not sent yet · Green trail bike')).toBeTruthy();
    fireEvent.press(local);
    await waitFor(() => expect(mockAdd).toHaveBeenCalled());
    expect(mockAdd.mock.calls[0][0].jobId).toBe(-1);
  });
});
