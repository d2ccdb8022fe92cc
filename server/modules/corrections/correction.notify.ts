/**
 * E-mail about corrections, through the outbox. Editors get one message per new
 * proposal (proposals are few and each needs a decision; a digest would delay them
 * and needs a scheduler); the proposer gets each decision with the editor's note.
 */
import type { EntityManager } from 'typeorm';
import { In, IsNull, Not } from 'typeorm';
import { config } from '@/server/config';
import { enqueue } from '../mail/mailer';
import { User } from '../users/user.entity';
import type { Correction } from './correction.entity';
import { citationText } from '@/lib/format/citation';

export async function notifyEditors(m: EntityManager, c: Correction, proposerName: string, what: string) {
  const editors = await m
    .getRepository(User)
    .find({ where: { role: In(['editor', 'admin']), disabledAt: IsNull(), emailVerifiedAt: Not(IsNull()) } });
  for (const e of editors) {
    await enqueue(m, {
      to: e.email,
      subject: `Correction #${c.id} to review: ${what}`,
      text: `Hello ${e.displayName},\n\n${proposerName} proposed a correction to ${what}.\n\nRationale: ${c.rationale}\nSource: ${citationText(c.citation, c.citation.page)}\n\nReview it: ${config.appUrl}/review/${c.id}\n`,
    });
  }
}

export async function notifyProposer(m: EntityManager, c: Correction, what: string) {
  const proposer = await m.getRepository(User).findOneBy({ id: c.proposerId });
  if (!proposer) return;
  const decision =
    c.status === 'accepted' ? 'accepted: the library now shows your values, credited to you' : 'not accepted';
  await enqueue(m, {
    to: proposer.email,
    subject: `Your correction #${c.id} was ${c.status}`,
    text: `Hello ${proposer.displayName},\n\nYour correction to ${what} was ${decision}.\n${c.decisionNote ? `\nNote from ${c.reviewerName}: ${c.decisionNote}\n` : ''}\nSee your proposals: ${config.appUrl}/corrections\n`,
  });
}
