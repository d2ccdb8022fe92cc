/**
 * The safety cautions a spec's screen or the calculator shows. Ignition and charging
 * work can hurt people; the texts are the trade's usual cautions and always defer to the
 * maker's manual and local codes. Which categories apply is the classifier's
 * (lib/specs/classify.ts cautionCategories).
 */
import { cautionCategories, type CautionCategory } from '../specs/classify';

export type CautionNote = { id: CautionCategory; title: string; lines: string[] };

const DEFER =
  "Follow the maker's service manual and local codes; Specbench's figures and verdicts assist, they do not replace them.";

const NOTES: CautionNote[] = [
  {
    id: 'high-voltage',
    title: 'high secondary voltage',
    lines: [
      'The ignition secondary can reach tens of thousands of volts: never hold a lead or plug cap while cranking or running.',
      'Fuel vapour near an open spark can ignite: test sparks away from the tank, carburettor and spilled fuel.',
      'Disconnect the battery before unplugging ignition modules or coils.',
    ],
  },
  {
    id: 'charging',
    title: 'charging system',
    lines: [
      'Stator output on an unloaded circuit can exceed 50 V AC at high rpm: keep clear of the terminals while the engine runs.',
      'Keep hands, leads and clothing away from the drive chain, belt and fan when measuring with the engine running.',
      'Disconnect the battery before unplugging the regulator / rectifier.',
    ],
  },
  {
    id: 'battery',
    title: 'battery',
    lines: [
      'Lead-acid batteries give off hydrogen: no sparks or flames nearby, and connect or disconnect the meter away from the vent.',
      'Let the battery rest at least 6 hours (24 hours is better) with no charge or load before judging its rest voltage.',
      'Electrolyte is corrosive: wear eye protection.',
    ],
  },
];

/** The notes of these categories, in their usual order, and the deferral to the maker's manual. */
export function cautionsOf(categories: readonly CautionCategory[]): { notes: CautionNote[]; defer: string } {
  return { notes: NOTES.filter((n) => categories.includes(n.id)), defer: DEFER };
}

export function cautionsFor(component: string, parameter: string): { notes: CautionNote[]; defer: string } {
  return cautionsOf(cautionCategories(component, parameter));
}
