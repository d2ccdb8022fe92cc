/** A plan as the JSON editor shows it: the fields an editor changes, in the plan file's order. */
import type { PlanDto } from '../contracts/plans';

export type EditablePlan = Pick<PlanDto, 'title' | 'symptom' | 'system' | 'modelId' | 'status' | 'citation' | 'steps'>;

/**
 * The plan's editable fields as indented JSON (the id, version and dates are not the editor's).
 * A proposal leaves the citation out: its own source fields become the plan's.
 */
export function planJsonText(p: EditablePlan, { citation = true } = {}): string {
  const { title, symptom, system, modelId, status, steps } = p;
  return JSON.stringify(
    { title, symptom, system, modelId, status, ...(citation ? { citation: p.citation } : {}), steps },
    null,
    2,
  );
}
