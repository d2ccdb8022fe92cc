/**
 * What a revert would change: the spec's values now against the revision's snapshot, over
 * the same fields and with the same helpers as the server's history (lib/contracts/spec-snapshot.ts).
 */
import type { FieldChangeDto } from '@/lib/contracts/curation';
import type { SpecDetailDto } from '@/lib/contracts/library';
import type { SpecSnapshot } from '@/lib/contracts/spec-fields';
import { diffSnapshots, snapshotOfSpec } from '@/lib/contracts/spec-snapshot';

export type Snapshot = Partial<SpecSnapshot>;

export function snapshotOfDetail(s: SpecDetailDto): Snapshot {
  return snapshotOfSpec({ ...s, sourceId: s.source?.id ?? null }, s.source);
}

export const revertChanges = (now: Snapshot, target: Snapshot): FieldChangeDto[] => diffSnapshots(now, target);
