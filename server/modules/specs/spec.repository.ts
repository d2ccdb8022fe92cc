/**
 * The specs and revisions queries. A spec card is read with its component, model, make and
 * cited source through the entities' relations; revisions are the append-only history.
 * Bind to a transaction with `m.withRepository(...)`.
 */
import type { Actor } from '@/server/auth/actor';
import { AppDataSource } from '@/server/db/data-source';
import type { RevisionOrigin } from '@/lib/contracts/enums';
import type { SpecSnapshot } from '@/lib/contracts/spec-fields';
import { Source } from '../library/source.entity';
import { Spec } from './spec.entity';
import { SpecRevision } from './spec-revision.entity';

export const SpecRepository = AppDataSource.getRepository(Spec).extend({
  /** The spec with its component, model, make and source, as the card shows it. */
  findCard(id: number): Promise<Spec | null> {
    return this.findOne({ where: { id }, relations: { component: { model: { make: true } }, source: true } });
  },
  /** The row, locked for update until the transaction ends. */
  lockById(id: number): Promise<Spec | null> {
    return this.findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  },
  /** The component's spec for a parameter (by its folded key), if there is one. */
  findByParameterKey(componentId: number, parameterKey: string): Promise<Spec | null> {
    return this.findOneBy({ componentId, parameterKey });
  },
  /** Only the id, version and status, or null when there is no such spec. */
  versionOf(id: number): Promise<Pick<Spec, 'id' | 'version' | 'status'> | null> {
    return this.findOne({ where: { id }, select: { id: true, version: true, status: true } });
  },
});

export type NewRevision = {
  specId: number;
  version: number;
  snapshot: SpecSnapshot;
  changedFields: string[];
  actor: Actor;
  reason: string;
  origin: RevisionOrigin;
  originRef: string | null;
};

export const RevisionRepository = AppDataSource.getRepository(SpecRevision).extend({
  /** One spec's revisions, oldest or newest first. */
  historyOf(specId: number, order: 'ASC' | 'DESC'): Promise<SpecRevision[]> {
    return this.find({ where: { specId }, order: { version: order } });
  },
  async append(r: NewRevision): Promise<void> {
    const { actor, ...rest } = r;
    await this.insert({ ...rest, authorId: actor.id, authorName: actor.name });
  },
});

export const SourceRepository = AppDataSource.getRepository(Source).extend({
  /** The cited source, or null for a spec without one. */
  findCited(id: number | null): Promise<Source | null> {
    return id === null ? Promise.resolve(null) : this.findOneBy({ id });
  },
});
