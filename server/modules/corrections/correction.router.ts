import { Router } from 'express';
import { AcceptBody, CorrectionsQuery, EditProposalBody, ProposeBody, RejectBody } from '@/lib/contracts/corrections';
import { IdParams } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { limiter } from '@/server/middleware/rate-limit';
import { decide, editProposal, findVisible, propose, withdraw } from './correction.service';
import { correctionSummary, listCorrections } from './correction.query';
import { toReview } from './correction.view';

const create = route({ body: ProposeBody, status: 201 }, ({ user, body }) => propose(user, body));
const list = route({ query: CorrectionsQuery }, ({ user, query }) => listCorrections(user, query));
const show = route({ params: IdParams }, async ({ user, params }) =>
  toReview(await findVisible(user, params.id), user),
);
const summary = route({}, ({ user }) => correctionSummary(user));
const edit = route({ params: IdParams, body: EditProposalBody }, ({ user, params, body }) =>
  editProposal(user, params.id, body),
);
const withdrawRoute = route({ params: IdParams }, ({ user, params }) => withdraw(user, params.id));
const accept = route({ params: IdParams, body: AcceptBody }, ({ user, params, body }) =>
  decide(user, params.id, { accept: true, body }),
);
const reject = route({ params: IdParams, body: RejectBody }, ({ user, params, body }) =>
  decide(user, params.id, { accept: false, note: body.note }),
);

export function correctionRouter() {
  const r = Router();
  // Per account: a burst of proposals is abuse or a script, not a technician.
  const proposals = limiter('proposals', 20, 60 * 60_000, (req) => String(req.user?.id ?? ''));
  r.post('/', proposals, create);
  r.get('/', list);
  r.get('/summary', summary);
  r.get('/:id', show);
  r.patch('/:id', edit);
  r.post('/:id/withdraw', withdrawRoute);
  r.post('/:id/accept', accept);
  r.post('/:id/reject', reject);
  return r;
}
