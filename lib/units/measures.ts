/**
 * convert-units 3 configured for Specbench: its own definitions plus an electrical
 * `resistance` measure (it has none) and a `thou` unit, with the inch–metre link made exact.
 *
 * Why the length override: convert-units links its imperial and metric systems through
 * 1 ft = 1/3.28084 m, which is 3.2e-8 short of the exact 1959 definition
 * (1 in = 25.4 mm, NIST SP 811 Appendix B). 0.3048 = 381/1250 exactly.
 */
import configureMeasurements, { type Measure, type Unit } from 'convert-units';
// Only the measures Specbench uses: the full set would add every unit of mass, energy… to the app bundle.
import baseLength from 'convert-units/definitions/length';
import voltage from 'convert-units/definitions/voltage';
import current from 'convert-units/definitions/current';

type ResistanceUnit = 'Ω' | 'kΩ' | 'MΩ';

const unit = (singular: string, plural: string, toAnchor: Unit['to_anchor']): Unit => ({
  name: { singular, plural },
  to_anchor: toAnchor,
});

export const resistance: Measure<'SI', ResistanceUnit> = {
  systems: {
    SI: {
      Ω: unit('Ohm', 'Ohms', 1),
      kΩ: unit('Kiloohm', 'Kiloohms', 1e3),
      MΩ: unit('Megaohm', 'Megaohms', 1e6),
    },
  },
};

export const length: Measure<string, string> = {
  systems: {
    ...baseLength.systems,
    imperial: {
      ...baseLength.systems.imperial,
      // Thousandth of an inch, the feeler-gauge unit: 1 thou = 1/12000 ft = 0.0254 mm exactly.
      thou: unit('Thou', 'Thou', { numerator: 1, denominator: 12000 }),
    },
  },
  anchors: {
    metric: { imperial: { ratio: { numerator: 1250, denominator: 381 } } },
    imperial: { metric: { ratio: { numerator: 381, denominator: 1250 } } },
  },
};

export { current, voltage };

/** convert-units itself, for naming units and picking the best one; the conversion of values is ./exact's. */
export const convertUnits = configureMeasurements({
  length,
  voltage,
  current,
  resistance,
} as Record<string, Measure<string, string>>);
