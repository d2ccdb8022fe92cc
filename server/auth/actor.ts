import type {} from 'passport';
import './roles';
import type { Request } from 'express';
import { AppError } from '../errors/app-error';

/** The signed-in account as the author of a change (revisions, import batches). */
export type Actor = { id: number | null; name: string };

export function actorOf(req: Request): Actor {
  if (!req.user) throw AppError.unauthorized();
  return { id: req.user.id, name: req.user.displayName };
}
