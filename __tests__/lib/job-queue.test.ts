/**
 * A job started with no connection: queued with its own Idempotency-Key and a local
 * (negative) id, readings added to it wait behind it, and once the server has it they
 * move to its number. The runner is driven with in-memory storage and fake sends.
 */
import { ApiError } from '@/lib/api/client';
import type { JobDetailDto, ReadingDto } from '@/lib/contracts/jobs';
import { ReadingQueueRunner } from '@/lib/offline/queue-runner';
import { toReadingBody } from '@/lib/offline/reading-body';
import {
  EMPTY_QUEUE,
  STORAGE_KEY,
  SENT_JOBS_KEPT,
  enqueueJob,
  isLocalJobId,
  nextLocalJobId,
  parseQueue,
  queuedJobSummary,
  queuedJobsMatching,
  resolveJob,
  sendable,
  waitingFor,
  waitingMessage,
  type QueuedJob,
  type QueuedReading,
} from '@/lib/offline/reading-queue';
import { memoryStorage } from '../helpers/memory-storage';

const memory = memoryStorage;
const offline = () => jest.fn().mockRejectedValue(new TypeError('Failed to fetch'));
const preview = {
  label: 'primary winding',
  componentName: 'ignition coil',
  value: 3.1,
  unit: 'Ω',
  verdict: 'pass' as const,
};
const body = toReadingBody(
  { spec: { min: 2.4, max: 3.2, nominal: null, unit: 'Ω', material: 'none' }, reading: { value: 3.1, unit: 'Ω' } },
  { label: 'primary winding' },
);
const newJob = (userId = 1) => ({
  userId,
  body: { machineLabel: 'Blue trail bike', machineId: 'VIN-1' },
  modelTitle: null,
});
const detail = (id: number) => ({ id, readings: [] }) as unknown as JobDetailDto;
let n = 0;
const options = (sendJob: jest.Mock) => ({
  newKey: () => `job-key-${++n}`,
  now: () => new Date('2026-03-04T05:06:07.000Z'),
  sendJob,
});

const job = (localId: number, key = `k${-localId}`): QueuedJob => ({
  key,
  userId: 1,
  localId,
  body: {},
  modelTitle: null,
  queuedAt: '2026-03-04T05:06:07.000Z',
  attempts: 0,
  lastError: null,
});

describe('queued jobs: the pure rules', () => {
  it('local ids are negative, and never reuse one still remembered (queued, refused or sent)', () => {
    expect(nextLocalJobId(EMPTY_QUEUE)).toBe(-1);
    const two = enqueueJob(enqueueJob(EMPTY_QUEUE, job(-1)), job(-2));
    expect(nextLocalJobId(two)).toBe(-3);
    const sent = resolveJob(two, 'k2', 90);
    expect(sent.jobs.map((j) => j.localId)).toEqual([-1]);
    expect(nextLocalJobId(sent)).toBe(-3);
    expect([0, 5, 1.5, -0.5].map(isLocalJobId)).toEqual([false, false, false, false]);
    expect(isLocalJobId(-4)).toBe(true);
  });

  it('resolving moves the waiting readings of that job (and only those) to its server id', () => {
    const reading = (key: string, jobId: number, userId = 1) => ({
      key,
      userId,
      jobId,
      body,
      preview,
      queuedAt: '',
      attempts: 0,
      lastError: null,
    });
    let s = enqueueJob(EMPTY_QUEUE, job(-1));
    s = { ...s, pending: [reading('a', -1), reading('b', 7), reading('c', -1, 2)] };
    expect(sendable(s, 1).map((r) => r.key)).toEqual(['b']);
    expect(waitingFor(s, 1).map((r) => r.key)).toEqual(['a', 'b']);
    s = resolveJob(s, 'k1', 55);
    expect(s.pending.map((r) => [r.key, r.jobId])).toEqual([
      ['a', 55],
      ['b', 7],
      ['c', -1],
    ]);
    expect(s.sentJobs).toEqual([{ localId: -1, jobId: 55, userId: 1 }]);
  });

  it('only the newest sent jobs are remembered', () => {
    let s = EMPTY_QUEUE;
    for (let i = 1; i <= SENT_JOBS_KEPT + 5; i++) s = resolveJob(enqueueJob(s, job(-i)), `k${i}`, 1000 + i);
    expect(s.sentJobs).toHaveLength(SENT_JOBS_KEPT);
    expect(s.sentJobs[0].localId).toBe(-6);
  });

  it('a queue stored before jobs could be queued still reads, with no jobs', () => {
    const old = JSON.stringify({ pending: [], rejected: [] });
    expect(parseQueue(old)).toEqual(EMPTY_QUEUE);
    // A stored "job" with a server-like id is not a local job: dropped rather than sent twice.
    expect(parseQueue(JSON.stringify({ jobs: [{ ...job(-1), localId: 4 }] })).jobs).toEqual([]);
  });

  it('a queued job shows as an open job with no readings, under the local id', () => {
    expect(queuedJobSummary({ ...job(-3), body: { customerRef: 'R-9', notes: '' } }, 'Dana')).toMatchObject({
      id: -3,
      ownerName: 'Dana',
      status: 'open',
      customerRef: 'R-9',
      notes: null,
      counts: { pass: 0, marginal: 0, fail: 0 },
    });
  });

  it('My jobs shows a queued job for a search on what it says, never under "closed"', () => {
    const j = queuedJobSummary({ ...job(-1), body: { machineLabel: 'Blue quad', customerRef: 'R-77' } }, 'Dana');
    expect(queuedJobsMatching([j], '  r-77 ', undefined)).toEqual([j]);
    expect(queuedJobsMatching([j], 'blue', 'open')).toEqual([j]);
    expect(queuedJobsMatching([j], 'green', undefined)).toEqual([]);
    expect(queuedJobsMatching([j], '', 'closed')).toEqual([]);
  });

  it.each([
    [0, 1, '1 job waiting to be sent — it will go when the connection returns'],
    [2, 1, '1 job and 2 readings waiting to be sent — they will go when the connection returns'],
    [1, 0, '1 reading waiting to be sent — it will go when the connection returns'],
    [0, 0, ''],
  ])('waitingMessage(%d readings, %d jobs)', (readings, jobs, text) => {
    expect(waitingMessage(readings, jobs)).toBe(text);
  });
});

describe('queued jobs: the runner', () => {
  it('online: the job is sent at once with its key, and nothing stays queued', async () => {
    const { data, storage } = memory();
    const sendJob = jest.fn(async (_item: QueuedJob) => detail(31));
    const runner = new ReadingQueueRunner(storage, jest.fn(), options(sendJob));
    await expect(runner.addJob(newJob())).resolves.toEqual({ status: 'sent', job: detail(31) });
    expect(sendJob.mock.calls[0][0]).toMatchObject({ key: expect.stringMatching(/^job-key-/), localId: -1 });
    expect(parseQueue(data.get(STORAGE_KEY)!).jobs).toEqual([]);
  });

  it('offline: job and readings wait; back online the job goes first, once, and its readings follow to its id', async () => {
    const { storage } = memory();
    const down = offline();
    const sendReading = jest.fn().mockRejectedValue(new TypeError('Failed to fetch'));
    const runner = new ReadingQueueRunner(storage, sendReading, options(down));
    const started = await runner.addJob(newJob());
    expect(started).toEqual({ status: 'queued', localId: -1 });
    // A reading on the job not sent yet is not even tried: there is no server id to send it to.
    await expect(runner.add({ userId: 1, jobId: -1, body, preview })).resolves.toMatchObject({ status: 'queued' });
    expect(sendReading).not.toHaveBeenCalled();
    await runner.flush(1);
    expect(down).toHaveBeenCalledTimes(2);
    expect(sendReading).not.toHaveBeenCalled();

    const order: string[] = [];
    const up = jest.fn(async (_item: QueuedJob) => (order.push('job'), detail(77)));
    const later = new ReadingQueueRunner(
      storage,
      jest.fn(async (item) => (order.push(`reading→${item.jobId}`), { id: 5 }) as unknown as ReadingDto),
      options(up),
    );
    const sent = jest.fn();
    later.onJobSent(sent);
    await Promise.all([later.flush(1), later.flush(1)]);
    expect(order).toEqual(['job', 'reading→77']);
    expect(up.mock.calls[0][0].key).toBe(down.mock.calls[0][0].key);
    expect(sent).toHaveBeenCalledTimes(1);
    expect(later.getSnapshot()).toMatchObject({ jobs: [], pending: [], sentJobs: [{ localId: -1, jobId: 77 }] });
    // A screen still showing the local id adds to the job's number.
    const send = jest.fn(async (_item: QueuedReading) => ({ id: 6 }) as unknown as ReadingDto);
    const third = new ReadingQueueRunner(storage, send, options(up));
    await third.add({ userId: 1, jobId: -1, body, preview });
    expect(send.mock.calls[0][0].jobId).toBe(77);
  });

  it('a job the server refuses takes its waiting readings with it, each saying why', async () => {
    const { storage } = memory();
    const runner = new ReadingQueueRunner(storage, jest.fn(), options(offline()));
    await runner.addJob(newJob());
    await runner.add({ userId: 1, jobId: -1, body, preview });
    const refused = new ApiError(422, 'validation_failed', 'No model with id 9 in the library.');
    const again = new ReadingQueueRunner(storage, jest.fn(), options(jest.fn().mockRejectedValue(refused)));
    await again.flush(1);
    expect(again.getSnapshot()).toMatchObject({
      jobs: [],
      pending: [],
      rejectedJobs: [{ localId: -1, status: 422, message: 'No model with id 9 in the library.' }],
      rejected: [{ jobId: -1, message: 'Its job was not saved: No model with id 9 in the library.' }],
    });
  });

  it("one account's queued jobs are never sent for another", async () => {
    const { storage } = memory();
    await new ReadingQueueRunner(storage, jest.fn(), options(offline())).addJob(newJob(2));
    const up = jest.fn(async () => detail(8));
    const runner = new ReadingQueueRunner(storage, jest.fn(), options(up));
    await runner.flush(1);
    expect(up).not.toHaveBeenCalled();
    expect(runner.getSnapshot().jobs).toHaveLength(1);
  });

  it('a reading for a job that was refused is refused at once, not kept waiting for ever', async () => {
    const { storage } = memory();
    const refused = new ApiError(422, 'unprocessable', 'No model with id 9 in the library.');
    const runner = new ReadingQueueRunner(storage, jest.fn(), options(jest.fn().mockRejectedValue(refused)));
    expect((await runner.addJob(newJob())).status).toBe('rejected');
    const outcome = await runner.add({ userId: 1, jobId: -1, body, preview });
    expect(outcome).toEqual({ status: 'rejected', message: expect.stringMatching(/^Its job was not saved/) });
    expect(runner.getSnapshot().pending).toEqual([]);
  });
});
