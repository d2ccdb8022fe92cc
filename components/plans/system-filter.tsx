import { SYSTEM_LABELS, SYSTEMS, type System } from '@/lib/contracts/plans';
import { ChoiceRow } from '../ui/choice-row';

export type SystemFilterProps = { value: System | null; onChange: (s: System | null) => void };

/** Every system, in the trade's order, and "All". */
export function SystemFilter({ value, onChange }: SystemFilterProps) {
  const options = [{ value: null, label: 'All' }, ...SYSTEMS.map((s) => ({ value: s, label: SYSTEM_LABELS[s] }))];
  return <ChoiceRow<System | null> label="System" options={options} value={value} onChange={onChange} />;
}
