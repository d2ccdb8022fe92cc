/**
 * A test plan run with no signal: each result is judged on the device with the shared
 * rules, the run goes on by the plan's branches, the results wait in the device's queue
 * and go once, in order; a refused one takes the later ones of its run with it.
 * The plan here is a small invented one; the one trade fact is the 12.4 V rested battery
 * minimum, used as a typed limit (from memory: a lead-acid battery rested near 12.4 V is
 * about 75 % charged, common practice, no published source).
 */
import type { RunAnswerDto, RunDto, RunResultBody, RunStepDto } from '@/lib/contracts/plans';
import { ReadingQueueRunner } from '@/lib/offline/queue-runner';
import { parseQueue, type QueuedResult } from '@/lib/offline/reading-queue';
import { judgeOnDevice, StepResultError } from '@/lib/plans/judge-step';
import { withWaiting } from '@/lib/plans/local-run';
import { ApiError } from '@/lib/api/client';
import { memoryStorage } from '../helpers/memory-storage';

const base = {
  instructions: '',
  preconditions: [],
  cautions: [],
  testPoint: { text: '' },
  spec: null,
  connector: null,
};
const STEPS = [
  {
    ...base,
    id: 'battery',
    title: 'Battery rest voltage',
    position: 0,
    check: { kind: 'limits', limits: { min: 12.4, unit: 'V' } },
    next: { pass: { step: 'fuse' }, fail: { finding: { part: 'Battery', advice: 'Charge it and test again.' } } },
  },
  {
    ...base,
    id: 'fuse',
    title: 'Main fuse',
    position: 1,
    check: { kind: 'qualitative', test: 'continuity', expected: 'The fuse conducts' },
    next: { pass: { step: 'look' }, fail: { finding: { part: 'Main fuse', advice: 'Replace the fuse.' } } },
  },
  {
    ...base,
    id: 'look',
    title: 'Plug condition',
    position: 2,
    check: {
      kind: 'observation',
      choices: [
        { id: 'wet', label: 'Wet with fuel' },
        { id: 'dry', label: 'Dry' },
      ],
    },
    next: {
      wet: { finding: { part: 'Spark plug', advice: 'Dry or replace the plug.' } },
      dry: { finding: { part: 'Fuel supply', advice: 'Check the fuel supply.' } },
    },
  },
] as unknown as RunStepDto[];

const RUN: RunDto = {
  id: 5,
  jobId: 3,
  planId: 1,
  planVersion: 1,
  title: 'Will not start',
  symptom: 'Cranks, will not start',
  system: 'ignition',
  status: 'active',
  stepCount: 3,
  currentStep: STEPS[0],
  steps: STEPS,
  finding: null,
  results: [],
  startedAt: '2026-03-01T10:00:00.000Z',
  updatedAt: '2026-03-01T10:00:00.000Z',
};

const body = (stepId: string, rest: Omit<RunResultBody, 'stepId'>) => ({ stepId, ...rest }) as RunResultBody;
const queued = (b: RunResultBody, i: number): QueuedResult => ({
  key: `k${i}`,
  userId: 1,
  jobId: 3,
  runId: 5,
  body: b,
  title: STEPS.find((s) => s.id === b.stepId)!.title,
  judged: judgeOnDevice(
    STEPS.find((s) => s.id === b.stepId)!,
    b,
  ),
  queuedAt: '2026-03-01T10:05:00.000Z',
  attempts: 0,
  lastError: null,
});

describe('judgeOnDevice', () => {
  it('a reading against the step’s limits, with the engine (12.3 V under a 12.4 V minimum fails)', () => {
    expect(judgeOnDevice(STEPS[0], body('battery', { reading: { value: 12.7, unit: 'V' } })).verdict).toBe('pass');
    expect(judgeOnDevice(STEPS[0], body('battery', { reading: { value: 12.3, unit: 'V' } })).outcome).toBe('fail');
  });

  it('continuity, an observation and a skip, as the server words them', () => {
    expect(judgeOnDevice(STEPS[1], body('fuse', { outcome: 'pass' }))).toMatchObject({
      outcome: 'pass',
      verdict: 'pass',
    });
    expect(judgeOnDevice(STEPS[2], body('look', { outcome: 'dry' }))).toEqual({
      outcome: 'dry',
      verdict: null,
      reason: 'Dry',
    });
    expect(judgeOnDevice(STEPS[1], body('fuse', { skipReason: 'No access' }))).toEqual({
      outcome: 'skip',
      verdict: null,
      reason: 'Skipped: No access',
    });
  });

  it('a result the step cannot take is refused on the device, naming the field', () => {
    expect(() => judgeOnDevice(STEPS[2], body('look', { outcome: 'green' }))).toThrow(StepResultError);
    expect(() => judgeOnDevice(STEPS[0], body('battery', { outcome: 'pass' }))).toThrow(/needs a reading/);
  });
});

describe('withWaiting', () => {
  it('applies the waiting results in order by the plan’s branches, to the finding', () => {
    const waiting = [
      queued(body('battery', { reading: { value: 12.7, unit: 'V' } }), 1),
      queued(body('fuse', { outcome: 'pass' }), 2),
      queued(body('look', { outcome: 'wet' }), 3),
    ];
    const two = withWaiting(RUN, waiting.slice(0, 2));
    expect(two).toMatchObject({ waiting: 2, status: 'active', currentStep: { id: 'look' } });
    expect(two.results.map((r) => [r.stepId, r.outcome])).toEqual([
      ['battery', 'pass'],
      ['fuse', 'pass'],
    ]);
    expect(withWaiting(RUN, waiting)).toMatchObject({
      status: 'concluded',
      currentStep: null,
      finding: { part: 'Spark plug', stepId: 'look' },
    });
  });

  it('a waiting result for another step than the run is at is not applied (the server decides)', () => {
    expect(withWaiting(RUN, [queued(body('fuse', { outcome: 'pass' }), 1)])).toMatchObject({
      waiting: 0,
      currentStep: { id: 'battery' },
    });
  });
});

describe('the queue runner with step results', () => {
  const answer = (stepId: string) => ({ judged: { stepId }, run: RUN }) as unknown as RunAnswerDto;
  const item = (b: RunResultBody) => {
    const step = STEPS.find((s) => s.id === b.stepId)!;
    return { userId: 1, jobId: 3, runId: 5, body: b, title: step.title, judged: judgeOnDevice(step, b) };
  };
  let n = 0;
  const opts = (sendResult: jest.Mock) => ({ newKey: () => `rk-${++n}`, sendResult });

  it('offline results wait; back online they go once each, in the order taken, with their keys', async () => {
    const { storage } = memoryStorage();
    const down = jest.fn().mockRejectedValue(new TypeError('Failed to fetch'));
    const offline = new ReadingQueueRunner(storage, jest.fn(), opts(down));
    await expect(
      offline.addResult(item(body('battery', { reading: { value: 12.7, unit: 'V' } }))),
    ).resolves.toMatchObject({
      status: 'queued',
    });
    // The second waits behind the first: not even tried.
    await offline.addResult(item(body('fuse', { outcome: 'pass' })));
    expect(down).toHaveBeenCalledTimes(1);

    const order: string[] = [];
    const up = jest.fn(async (r: QueuedResult) => (order.push(`${r.body.stepId}:${r.key}`), answer(r.body.stepId)));
    const online = new ReadingQueueRunner(storage, jest.fn(), opts(up));
    const sent = jest.fn();
    online.onResultSent(sent);
    await Promise.all([online.flush(1), online.flush(1)]);
    expect(order).toEqual([`battery:${down.mock.calls[0][0].key}`, expect.stringMatching(/^fuse:rk-/)]);
    expect(sent).toHaveBeenCalledTimes(2);
    expect(online.getSnapshot().results).toEqual([]);
  });

  it('a refused result takes the later results of its run with it, each saying why', async () => {
    const { data, storage } = memoryStorage();
    const down = jest.fn().mockRejectedValue(new TypeError('Failed to fetch'));
    const offline = new ReadingQueueRunner(storage, jest.fn(), opts(down));
    await offline.addResult(item(body('battery', { reading: { value: 12.7, unit: 'V' } })));
    await offline.addResult(item(body('fuse', { outcome: 'pass' })));
    const refused = new ApiError(409, 'conflict', 'The run is at step "fuse", not "battery".');
    const online = new ReadingQueueRunner(storage, jest.fn(), opts(jest.fn().mockRejectedValue(refused)));
    await online.flush(1);
    const state = parseQueue(data.get('specbench.reading-queue.v1')!);
    expect(state.results).toEqual([]);
    expect(state.rejectedResults.map((r) => [r.body.stepId, r.status, r.message])).toEqual([
      ['battery', 409, 'The run is at step "fuse", not "battery".'],
      ['fuse', 409, 'Not sent: an earlier step was refused (The run is at step "fuse", not "battery".)'],
    ]);
  });
});
