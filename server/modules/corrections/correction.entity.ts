import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

import { isPlanProposal, type SpecProposal, type StoredProposal } from '@/lib/contracts/corrections';
import {
  CORRECTION_KINDS,
  CORRECTION_STATUSES,
  type CorrectionKind,
  type CorrectionStatus,
} from '@/lib/contracts/enums';

/** A contributor's proposed change to the library, with its citation, waiting for an editor. */
@Entity({ name: 'corrections' })
@Index('ix_corrections_status_created', ['status', 'createdAt'])
export class Correction {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ type: 'enum', enum: CORRECTION_KINDS })
  kind: CorrectionKind;

  /** The spec to change (kind 'change'), or the spec created on acceptance. */
  @Index()
  @Column({ name: 'spec_id', type: 'int', nullable: true })
  specId: number | null;

  /** The component a new spec belongs to (kind 'new_spec'). */
  @Column({ name: 'component_id', type: 'int', nullable: true })
  componentId: number | null;

  /** The model a new component belongs to (kind 'new_component'), and the model of every proposal; null for a generic plan's. */
  @Index()
  @Column({ name: 'model_id', type: 'int', nullable: true })
  modelId: number | null;

  /** The test plan to change (kind 'plan_change'). */
  @Index()
  @Column({ name: 'plan_id', type: 'int', nullable: true })
  planId: number | null;

  @Index()
  @Column({ name: 'proposer_id', type: 'int' })
  proposerId: number;

  /** Proposed values (parameter, component, min, nominal, max, unit…), or `{ plan }`: the plan fields proposed. */
  @Column({ type: 'json' })
  proposed: StoredProposal;

  /** Citation: title, edition, page, url. */
  @Column({ type: 'json' })
  citation: { title: string; edition: string; page: string; url: string | null };

  @Column({ type: 'text' })
  rationale: string;

  @Column({ type: 'enum', enum: CORRECTION_STATUSES, default: 'pending' })
  status: CorrectionStatus;

  /** The spec (kind 'change') or plan (kind 'plan_change') version the proposal was made against. */
  @Column({ name: 'base_version', type: 'int', nullable: true })
  baseVersion: number | null;

  @Column({ name: 'reviewer_id', type: 'int', nullable: true })
  reviewerId: number | null;

  @Column({ name: 'reviewer_name', type: 'varchar', length: 80, nullable: true })
  reviewerName: string | null;

  @Column({ name: 'decision_note', type: 'text', nullable: true })
  decisionNote: string | null;

  @Column({ name: 'decided_at', type: 'datetime', precision: 3, nullable: true })
  decidedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}

/** The proposed spec values of a spec proposal (kinds change, new_spec, new_component). */
export function specProposalOf(c: Pick<Correction, 'id' | 'proposed'>): SpecProposal {
  if (isPlanProposal(c.proposed)) throw new Error(`Correction #${c.id} is about a test plan, not a spec.`);
  return c.proposed;
}
