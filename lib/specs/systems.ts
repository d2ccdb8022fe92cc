/**
 * Which system a component belongs to, from its name, so the model sheet lists components
 * by system in the trade's order (lib/contracts/plans.ts SYSTEMS) instead of alphabetically.
 * The first pattern that matches decides; a battery and the main fuse feed every system and
 * are listed with charging, where a diagnosis of any system starts (common practice, no
 * published source). Unknown names fall into 'other', listed last.
 */
import { SYSTEMS, type System } from '../contracts/plans';

export type SystemOrOther = System | 'other';

const PATTERNS: [RegExp, System][] = [
  [/fuel|injector|pump|ecu|throttle|o2|lambda/i, 'fuel'],
  [/start|crank|clutch switch|side ?stand|neutral/i, 'starting'],
  [/head ?light|tail|lights?\b|lamp|bulb|indicator|turn signal|flasher|horn|signal/i, 'lighting'],
  [/stator|regulat|rectifier|alternator|lighting coil|battery|main fuse|charging/i, 'charging'],
  [/ignition|coil|plug|spark|pickup|pulser|pulse|armature|cdi|ht lead|diode|kill|ignit/i, 'ignition'],
];

export function systemOf(componentName: string): SystemOrOther {
  return PATTERNS.find(([p]) => p.test(componentName))?.[1] ?? 'other';
}

/** Components grouped by system, in the trade's order, alphabetical within a system; empty systems left out. */
export function groupBySystem<C extends { name: string }>(
  components: C[],
): { system: SystemOrOther; components: C[] }[] {
  const order: SystemOrOther[] = [...SYSTEMS, 'other'];
  return order
    .map((system) => ({
      system,
      components: components.filter((c) => systemOf(c.name) === system).sort((a, b) => a.name.localeCompare(b.name)),
    }))
    .filter((g) => g.components.length > 0);
}
