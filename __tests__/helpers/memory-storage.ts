import type { QueueStorage } from '@/lib/offline/queue-runner';

/** Device storage for the queue runner, in memory: `data` shows what was written. */
export function memoryStorage() {
  const data = new Map<string, string>();
  const storage: QueueStorage = {
    getItem: async (k) => data.get(k) ?? null,
    setItem: async (k, v) => {
      data.set(k, v);
    },
  };
  return { data, storage };
}
