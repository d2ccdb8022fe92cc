/** Who may see or change a job: its owner and admins. Anyone else is told it does not exist (404). */
import type { SignedInUser } from '@/server/auth/roles';
import { AppError } from '@/server/errors/app-error';
import type { Job } from './job.entity';

export function mayUseJob(user: SignedInUser, job: Pick<Job, 'ownerId'>): boolean {
  return job.ownerId === user.id || user.role === 'admin';
}

/** The job when this user may use it; 404 when it is missing or someone else's. */
export function ownJobOr404(user: SignedInUser, job: Job | null, id: number): Job {
  if (!job || !mayUseJob(user, job)) throw AppError.notFound('job', id);
  return job;
}
