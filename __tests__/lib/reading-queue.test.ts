import { ApiError } from '@/lib/api/client';
import { IDEMPOTENCY_KEY, ReadingBody, type ReadingDto } from '@/lib/contracts/jobs';
import { ReadingQueueRunner } from '@/lib/offline/queue-runner';
import { toReadingBody } from '@/lib/offline/reading-body';
import {
  EMPTY_QUEUE,
  STORAGE_KEY,
  classifyFailure,
  dismissRejected,
  enqueue,
  newIdempotencyKey,
  parseQueue,
  pendingFor,
  rejectPending,
  waitingMessage,
  type QueuedReading,
} from '@/lib/offline/reading-queue';
import type { VerdictInput } from '@/lib/verdict';
import { memoryStorage } from '../helpers/memory-storage';

const INPUT: VerdictInput = {
  spec: { min: 2.4, nominal: 2.8, max: 3.2, unit: 'Ω', refTempC: 20, material: 'copper' },
  reading: { value: 3.1, unit: 'Ω' },
  leadResistance: { value: 0.3, unit: 'Ω' },
};
const preview = {
  label: 'primary winding resistance',
  componentName: 'ignition coil',
  value: 3.1,
  unit: 'Ω',
  verdict: 'pass' as const,
};

function item(key: string, patch: Partial<QueuedReading> = {}): QueuedReading {
  return {
    key,
    userId: 1,
    jobId: 7,
    body: toReadingBody(INPUT, { specId: 3 }),
    preview,
    queuedAt: '2026-01-01T10:00:00.000Z',
    attempts: 0,
    lastError: null,
    ...patch,
  };
}

describe('newIdempotencyKey', () => {
  it('uses crypto.randomUUID when the platform has it', () => {
    expect(newIdempotencyKey({ randomUUID: () => '0b8e7c1e-2a4f-4f7e-9a0c-5d9b1e2f3a4b' })).toBe(
      '0b8e7c1e-2a4f-4f7e-9a0c-5d9b1e2f3a4b',
    );
  });

  it.each([
    [
      'getRandomValues only',
      {
        getRandomValues: <T>(a: T) => {
          (a as unknown as Uint8Array).fill(200);
          return a;
        },
      },
    ],
    ['no crypto at all', {}],
  ])('with %s, makes a key the API accepts', (_name, source) => {
    const key = newIdempotencyKey(source as Parameters<typeof newIdempotencyKey>[0]);
    expect(key).toMatch(IDEMPOTENCY_KEY);
    expect(key).toHaveLength(32);
  });

  it('the default source gives distinct valid keys', () => {
    const keys = new Set(Array.from({ length: 500 }, () => newIdempotencyKey()));
    expect(keys.size).toBe(500);
    for (const k of keys) expect(k).toMatch(IDEMPOTENCY_KEY);
  });
});

describe('classifyFailure', () => {
  it.each([
    ['a fetch TypeError (offline)', new TypeError('Failed to fetch'), 'retry'],
    ['any error without an answer', new Error('aborted'), 'retry'],
    ['401 (session ended: sent after signing in again)', new ApiError(401, 'unauthorized', 'x'), 'retry'],
    ['408 timeout', new ApiError(408, 'timeout', 'x'), 'retry'],
    ['429 rate limit', new ApiError(429, 'too_many', 'x'), 'retry'],
    ['500', new ApiError(500, 'internal', 'x'), 'retry'],
    ['503 database restarting', new ApiError(503, 'unavailable', 'x'), 'retry'],
    ['400 validation', new ApiError(400, 'validation_failed', 'x'), 'drop'],
    ['404 job gone', new ApiError(404, 'not_found', 'x'), 'drop'],
    ['409 job closed', new ApiError(409, 'conflict', 'x'), 'drop'],
    ['422 impossible value', new ApiError(422, 'unprocessable', 'x'), 'drop'],
  ])('%s → %s', (_name, err, action) => {
    expect(classifyFailure(err)).toBe(action);
  });
});

describe('queue state', () => {
  it('enqueue ignores a key already waiting', () => {
    const once = enqueue(EMPTY_QUEUE, item('key-aaaa-1'));
    expect(enqueue(once, item('key-aaaa-1')).pending).toHaveLength(1);
  });

  it('a rejected reading leaves the queue but stays visible until dismissed', () => {
    const s = rejectPending(enqueue(EMPTY_QUEUE, item('key-aaaa-1')), 'key-aaaa-1', 409, 'This job is closed.');
    expect(s.pending).toHaveLength(0);
    expect(s.rejected).toMatchObject([{ key: 'key-aaaa-1', status: 409, message: 'This job is closed.' }]);
    expect(dismissRejected(s, 'key-aaaa-1').rejected).toHaveLength(0);
  });

  it('pendingFor keeps to one account and one job', () => {
    const s = [item('k-1-aaaaaa'), item('k-2-aaaaaa', { jobId: 8 }), item('k-3-aaaaaa', { userId: 2 })].reduce(
      enqueue,
      EMPTY_QUEUE,
    );
    expect(pendingFor(s, 1, 7).map((p) => p.key)).toEqual(['k-1-aaaaaa']);
  });

  it.each([[null], [''], ['not json'], ['{"pending":"x"}']])('parseQueue(%j) → an empty queue', (text) => {
    expect(parseQueue(text)).toEqual(EMPTY_QUEUE);
  });

  it.each([
    [0, ''],
    [1, '1 reading waiting to be sent — it will go when the connection returns'],
    [2, '2 readings waiting to be sent — they will go when the connection returns'],
  ])('waitingMessage(%d)', (n, text) => {
    expect(waitingMessage(n)).toBe(text);
  });
});

describe('toReadingBody', () => {
  it('a library spec goes by id, with the corrections as typed', () => {
    const body = toReadingBody(INPUT, { specId: 3 }, { retakeOf: 12 });
    expect(body).toEqual({
      specId: 3,
      reading: { value: 3.1, unit: 'Ω' },
      leadResistance: { value: 0.3, unit: 'Ω' },
      retakeOf: 12,
    });
    expect(ReadingBody.safeParse(body).success).toBe(true);
  });

  it('limits typed by hand go with the reading, with the label and without empty limits', () => {
    const body = toReadingBody(
      {
        spec: { min: 0.7, max: 0.8, nominal: null, unit: 'mm', material: 'none' },
        reading: { value: 0.03, unit: 'in' },
        meter: { percent: 1, counts: 2, countValue: 0.01, unit: 'mm' },
      },
      { label: ' Plug gap, cylinder 1 ' },
    );
    expect(body).toEqual({
      spec: { min: 0.7, max: 0.8, unit: 'mm', material: 'none' },
      label: 'Plug gap, cylinder 1',
      reading: { value: 0.03, unit: 'in' },
      meter: { percent: 1, counts: 2, countValue: 0.01, unit: 'mm' },
    });
    expect(ReadingBody.safeParse(body).success).toBe(true);
  });
});

describe('ReadingQueueRunner', () => {
  const memory = memoryStorage;
  const stored = (r: ReadingDto['id']) => ({ id: r }) as ReadingDto;
  let n = 0;
  const options = { newKey: () => `test-key-${++n}`, now: () => new Date('2026-02-03T04:05:06.000Z') };
  const reading = (jobId = 7, userId = 1) => ({ userId, jobId, body: toReadingBody(INPUT, { specId: 3 }), preview });

  it('online: sends at once with a key and the time taken, and leaves nothing queued', async () => {
    const { data, storage } = memory();
    const send = jest.fn(async () => stored(41));
    const runner = new ReadingQueueRunner(storage, send, options);
    const sent = jest.fn();
    runner.onSent(sent);
    await expect(runner.add(reading())).resolves.toEqual({ status: 'sent', reading: { id: 41 } });
    expect(send.mock.calls[0]).toEqual([
      expect.objectContaining({
        key: expect.stringMatching(IDEMPOTENCY_KEY),
        body: expect.objectContaining({ takenAt: '2026-02-03T04:05:06.000Z' }),
      }),
    ]);
    expect(sent).toHaveBeenCalledTimes(1);
    expect(parseQueue(data.get(STORAGE_KEY)!).pending).toHaveLength(0);
  });

  it('offline: keeps the reading on the device and resends it with the same key when asked', async () => {
    const { data, storage } = memory();
    const send = jest.fn().mockRejectedValueOnce(new TypeError('Failed to fetch')).mockResolvedValue(stored(42));
    const runner = new ReadingQueueRunner(storage, send, options);
    const outcome = await runner.add(reading());
    expect(outcome.status).toBe('queued');
    expect(parseQueue(data.get(STORAGE_KEY)!).pending).toMatchObject([{ attempts: 1 }]);
    await runner.flush(1);
    expect(send).toHaveBeenCalledTimes(2);
    expect(send.mock.calls[1][0].key).toBe(send.mock.calls[0][0].key);
    expect(runner.getSnapshot().pending).toHaveLength(0);
  });

  it('after a restart, a new runner on the same storage sends what was left', async () => {
    const { storage } = memory();
    await new ReadingQueueRunner(storage, jest.fn().mockRejectedValue(new TypeError('offline')), options).add(
      reading(),
    );
    const send = jest.fn(async () => stored(43));
    const later = new ReadingQueueRunner(storage, send, options);
    await later.flush(1);
    expect(send).toHaveBeenCalledTimes(1);
    expect(later.getSnapshot().pending).toHaveLength(0);
  });

  it('a 4xx the reading cannot recover from: out of the queue, kept as rejected with the message', async () => {
    const { storage } = memory();
    const runner = new ReadingQueueRunner(
      storage,
      jest.fn().mockRejectedValue(new ApiError(409, 'conflict', 'This job is closed.')),
      options,
    );
    await expect(runner.add(reading())).resolves.toEqual({ status: 'rejected', message: 'This job is closed.' });
    expect(runner.getSnapshot()).toMatchObject({ pending: [], rejected: [{ status: 409 }] });
  });

  it('flush stops at the first network fault, and sends nothing of another account', async () => {
    const { storage } = memory();
    const offline = new ReadingQueueRunner(storage, jest.fn().mockRejectedValue(new TypeError('offline')), options);
    await offline.add(reading(7));
    await offline.add(reading(8));
    await offline.add(reading(9, 2));
    const send = jest.fn().mockRejectedValue(new TypeError('still offline'));
    const runner = new ReadingQueueRunner(storage, send, options);
    await runner.flush(1);
    expect(send).toHaveBeenCalledTimes(1);
    send.mockResolvedValue(stored(50));
    await runner.flush(1);
    expect(send.mock.calls.slice(1).map(([i]) => i.jobId)).toEqual([7, 8]);
    expect(runner.getSnapshot().pending.map((p) => p.userId)).toEqual([2]);
  });

  it('two flushes at once send each reading once', async () => {
    const { storage } = memory();
    await new ReadingQueueRunner(storage, jest.fn().mockRejectedValue(new TypeError('offline')), options).add(
      reading(),
    );
    const send = jest.fn(async () => stored(44));
    const runner = new ReadingQueueRunner(storage, send, options);
    await Promise.all([runner.flush(1), runner.flush(1), runner.flush(1)]);
    expect(send).toHaveBeenCalledTimes(1);
  });
});
