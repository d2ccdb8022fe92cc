/** Listing corrections: contributors see their own; editors see all (pending oldest first). */
import type { z } from 'zod';
import type { CorrectionDto, CorrectionsQuery } from '@/lib/contracts/corrections';
import { AppDataSource } from '@/server/db/data-source';
import { roleAtLeast, type SignedInUser } from '@/server/auth/roles';
import { foldKey } from '../library/keys';
import { Correction } from './correction.entity';
import { toDtos } from './correction.view';

export async function listCorrections(
  user: SignedInUser,
  q: z.infer<typeof CorrectionsQuery>,
): Promise<CorrectionDto[]> {
  const qb = AppDataSource.getRepository(Correction)
    .createQueryBuilder('c')
    // A generic plan's proposal has no model: it is listed unless a make or model is asked for.
    .leftJoin('vehicle_models', 'vm', 'vm.id = c.model_id')
    .leftJoin('makes', 'mk', 'mk.id = vm.make_id')
    .limit(200);
  if (q.mine === 'true' || !roleAtLeast(user.role, 'editor')) qb.andWhere('c.proposerId = :me', { me: user.id });
  if (q.status) qb.andWhere('c.status = :status', { status: q.status });
  if (q.make) qb.andWhere('mk.name_key = :make', { make: foldKey(q.make) });
  if (q.modelId) qb.andWhere('c.modelId = :modelId', { modelId: q.modelId });
  qb.orderBy('c.createdAt', q.status === 'pending' ? 'ASC' : 'DESC').addOrderBy(
    'c.id',
    q.status === 'pending' ? 'ASC' : 'DESC',
  );
  return toDtos(await qb.getMany());
}

export async function correctionSummary(user: SignedInUser) {
  const [row] = await AppDataSource.query(
    `SELECT SUM(status = 'pending') AS pending,
            SUM(proposer_id = ? AND status = 'pending') AS myPending,
            SUM(proposer_id = ? AND status IN ('accepted','rejected') AND decided_at > NOW() - INTERVAL 30 DAY) AS myRecentDecisions
       FROM corrections`,
    [user.id, user.id],
  );
  return {
    pendingForReview: roleAtLeast(user.role, 'editor') ? Number(row.pending ?? 0) : null,
    myPending: Number(row.myPending ?? 0),
    myRecentDecisions: Number(row.myRecentDecisions ?? 0),
  };
}
