import { Router } from 'express';
import { AcceptBody, CorrectionsQuery, EditProposalBody, ProposeBody, RejectBody } from '@/lib/contracts/corrections';
import { IdParams } from '@/lib/contracts/library';
import { validate } from '@/server/middleware/validate';
import { limiter } from '@/server/middleware/rate-limit';
import { decide, editProposal, findVisible, propose, withdraw } from './correction.service';
import { correctionSummary, listCorrections } from './correction.query';
import { toReview } from './correction.view';

export function correctionRouter() {
  const r = Router();
  // Per account: a burst of proposals is abuse or a script, not a technician.
  const proposals = limiter('proposals', 20, 60 * 60_000, (req) => String(req.user?.id ?? ''));
  r.post('/', proposals, validate('body', ProposeBody), async (req, res) => {
    res.status(201).json(await propose(req.user!, res.locals.body));
  });
  r.get('/', validate('query', CorrectionsQuery), async (req, res) =>
    res.json(await listCorrections(req.user!, res.locals.query)),
  );
  r.get('/summary', async (req, res) => res.json(await correctionSummary(req.user!)));
  r.get('/:id', validate('params', IdParams), async (req, res) =>
    res.json(await toReview(await findVisible(req.user!, res.locals.params.id))),
  );
  r.patch('/:id', validate('params', IdParams), validate('body', EditProposalBody), async (req, res) => {
    res.json(await editProposal(req.user!, res.locals.params.id, res.locals.body));
  });
  r.post('/:id/withdraw', validate('params', IdParams), async (req, res) =>
    res.json(await withdraw(req.user!, res.locals.params.id)),
  );
  r.post('/:id/accept', validate('params', IdParams), validate('body', AcceptBody), async (req, res) => {
    res.json(await decide(req.user!, res.locals.params.id, { accept: true, body: res.locals.body }));
  });
  r.post('/:id/reject', validate('params', IdParams), validate('body', RejectBody), async (req, res) => {
    res.json(await decide(req.user!, res.locals.params.id, { accept: false, note: res.locals.body.note }));
  });
  return r;
}
