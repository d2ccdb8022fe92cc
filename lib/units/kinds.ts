/**
 * The quantity kinds and canonical units Specbench knows, and the parser that turns what a
 * technician or a CSV cell writes ('ohms', 'kohm', 'mil', 'Ω' with the OHM SIGN) into one
 * canonical unit. Prefix case matters: 'mV' is millivolt, and 'MΩ' is megohm.
 */

export type QuantityKind = 'resistance' | 'voltage' | 'current' | 'length';
export type CanonicalUnit = 'Ω' | 'kΩ' | 'MΩ' | 'V' | 'mV' | 'A' | 'mA' | 'mm' | 'in' | 'thou';

const KIND_OF: Readonly<Record<CanonicalUnit, QuantityKind>> = {
  Ω: 'resistance',
  kΩ: 'resistance',
  MΩ: 'resistance',
  V: 'voltage',
  mV: 'voltage',
  A: 'current',
  mA: 'current',
  mm: 'length',
  in: 'length',
  thou: 'length',
};

export const CANONICAL_UNITS: readonly CanonicalUnit[] = Object.freeze(Object.keys(KIND_OF) as CanonicalUnit[]);

/** Spellings accepted besides the canonical symbols themselves (after OHM SIGN → omega). */
const ALIASES: Readonly<Record<string, CanonicalUnit>> = {
  ohm: 'Ω',
  ohms: 'Ω',
  Ohm: 'Ω',
  Ohms: 'Ω',
  kohm: 'kΩ',
  kohms: 'kΩ',
  kOhm: 'kΩ',
  kOhms: 'kΩ',
  // 'K' is not an SI prefix, but 'KΩ' is common on service sheets and cannot mean anything else.
  KΩ: 'kΩ',
  Kohm: 'kΩ',
  Mohm: 'MΩ',
  Mohms: 'MΩ',
  MOhm: 'MΩ',
  MOhms: 'MΩ',
  inch: 'in',
  inches: 'in',
  mil: 'thou',
  mils: 'thou',
};

const OHM_SIGN = '\u2126';
const GREEK_CAPITAL_OMEGA = '\u03A9';

export function isCanonicalUnit(text: unknown): text is CanonicalUnit {
  return typeof text === 'string' && Object.prototype.hasOwnProperty.call(KIND_OF, text);
}

export function parseUnit(text: string): { unit: CanonicalUnit; kind: QuantityKind } | null {
  if (typeof text !== 'string') return null;
  const cleaned = text.trim().split(OHM_SIGN).join(GREEK_CAPITAL_OMEGA);
  const unit = isCanonicalUnit(cleaned)
    ? cleaned
    : Object.prototype.hasOwnProperty.call(ALIASES, cleaned)
      ? ALIASES[cleaned]
      : null;
  return unit ? { unit, kind: KIND_OF[unit] } : null;
}

/** Throws a TypeError for a string that is not a canonical unit (a caller bug, not user input). */
export function unitKind(unit: CanonicalUnit): QuantityKind {
  if (!isCanonicalUnit(unit)) throw new TypeError(`Unknown unit '${String(unit)}'`);
  return KIND_OF[unit];
}

export function unitsOfKind(kind: QuantityKind): CanonicalUnit[] {
  return CANONICAL_UNITS.filter((unit) => KIND_OF[unit] === kind);
}
