import { useReadingQueueSync } from '@/lib/hooks/use-reading-queue';

/** Renders nothing: sends the readings waiting on this device (mounted once, in the root layout). */
export function ReadingQueueSync() {
  useReadingQueueSync();
  return null;
}
