import { useEffect, useRef, useState } from 'react';
import { emptyForm, type CalculatorForm } from '@/lib/calculator/form';
import { EMPTY_MEMORY, memorise, recall } from '@/lib/calculator/memory';
import { useMeterMemory } from '@/lib/hooks/use-meter-memory';
import type { CanonicalUnit, QuantityKind } from '@/lib/units';

const LEAD_KEYS: (keyof CalculatorForm)[] = ['lead', 'leadUnit'];
const METER_KEYS: (keyof CalculatorForm)[] = ['meterPercent', 'meterCounts', 'meterCountValue', 'meterUnit'];
const touches = (patch: Partial<CalculatorForm>, keys: (keyof CalculatorForm)[]) => keys.some((k) => k in patch);

/**
 * The calculator's typed values, with what came from the device's memory marked (for the chips).
 * Memory is offered once per spec quantity and unit; typing over a remembered value makes it typed.
 */
export function useCalculatorForm(kind: QuantityKind, unit: CanonicalUnit) {
  const [form, setForm] = useState<CalculatorForm>(() => emptyForm(unit));
  const [fromMemory, setFromMemory] = useState({ lead: false, meter: false });
  const [memory, remember] = useMeterMemory();
  const offeredFor = useRef<string | null>(null);

  useEffect(() => {
    const key = `${kind}|${unit}`;
    if (!memory || offeredFor.current === key) return;
    offeredFor.current = key;
    const recalled = recall(memory, kind, unit);
    // The remembered meter arrives from storage after the first render; a new spec's unit resets the typed values.
    setForm({ ...emptyForm(unit), ...recalled });
    setFromMemory({ lead: recalled.lead !== undefined, meter: recalled.meterPercent !== undefined });
  }, [memory, kind, unit]);

  const set = (patch: Partial<CalculatorForm>) => {
    const next = { ...form, ...patch };
    setForm(next);
    const lead = touches(patch, LEAD_KEYS);
    const meter = touches(patch, METER_KEYS);
    if (lead || meter) {
      setFromMemory((m) => ({ lead: m.lead && !lead, meter: m.meter && !meter }));
      remember(memorise(memory ?? EMPTY_MEMORY, kind, next));
    }
  };
  const clearLead = () => set({ lead: '' });
  const clearMeter = () => set({ meterPercent: '', meterCounts: '', meterCountValue: '', meterUnit: unit });
  return { form, set, fromMemory, clearLead, clearMeter };
}
