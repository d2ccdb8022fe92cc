/**
 * 12 V lead-acid state of charge from rest voltage (REFERENCES.md §5). Flooded: the Battery
 * Council International table at 80 °F (26.7 °C) as reproduced in battery makers' literature.
 * AGM: a battery maker's FAQ (not a standards body); its 100 % row reads 12.80–12.90 V and
 * 12.80 V is used as the row. Between rows the percentage is interpolated linearly, and the
 * note says so; outside the table it is clamped to 100 % or 0 %.
 */
import { formatNumber } from '../units';
import { VerdictInputError } from './types';

export type BatteryType = 'flooded' | 'agm';
export type StateOfCharge = { percent: number; interpolated: boolean; note: string };
type Row = readonly [volts: number, percent: number];

/** Rows from full to empty: [rest voltage V, state of charge %]. */
export const SOC_TABLES: Readonly<Record<BatteryType, readonly Row[]>> = {
  flooded: [
    [12.65, 100],
    [12.45, 75],
    [12.24, 50],
    [12.06, 25],
    [11.89, 0],
  ],
  agm: [
    [12.8, 100],
    [12.6, 75],
    [12.3, 50],
    [12.0, 25],
    [11.8, 0],
  ],
};

const SOURCE: Record<BatteryType, string> = {
  flooded: 'Flooded table: Battery Council International, at 80 °F (26.7 °C).',
  agm: "AGM table: a battery maker's FAQ (its 100 % row is 12.80–12.90 V; 12.80 V is used).",
};

export const REST_NOTE = 'Read at rest: at least 6 h, preferably 24 h, after charging or running, with no load.';

const ROW_MATCH_V = 1e-9;
const v = (volts: number) => `${formatNumber(volts, 4)} V`;
const pct = (percent: number) => `${formatNumber(percent, 3)} %`;

function locate(volts: number, rows: readonly Row[]): { percent: number; interpolated: boolean; text: string } {
  const [top, bottom] = [rows[0], rows[rows.length - 1]];
  const exact = rows.find(([rv]) => Math.abs(rv - volts) < ROW_MATCH_V);
  if (exact) return { percent: exact[1], interpolated: false, text: `${v(volts)} matches the ${pct(exact[1])} row.` };
  if (volts > top[0]) {
    return {
      percent: 100,
      interpolated: false,
      text: `${v(volts)} is above the 100 % row (${v(top[0])}): reported as 100 % (a higher reading soon after charging is surface charge).`,
    };
  }
  if (volts < bottom[0]) {
    return {
      percent: 0,
      interpolated: false,
      text: `${v(volts)} is below the 0 % row (${v(bottom[0])}): reported as 0 % (discharged).`,
    };
  }
  const i = rows.findIndex(([rv]) => rv < volts) - 1;
  const [[vHi, pHi], [vLo, pLo]] = [rows[i], rows[i + 1]];
  const percent = pLo + ((volts - vLo) / (vHi - vLo)) * (pHi - pLo);
  return {
    percent,
    interpolated: true,
    text: `${v(volts)} lies between the ${v(vLo)} (${pct(pLo)}) and ${v(vHi)} (${pct(pHi)}) rows: interpolated linearly to ${pct(percent)}.`,
  };
}

export function batteryStateOfCharge(volts: number, type: BatteryType): StateOfCharge {
  if (typeof volts !== 'number' || !Number.isFinite(volts)) {
    throw new VerdictInputError('volts', `volts must be a finite number (got ${String(volts)})`);
  }
  if (type !== 'flooded' && type !== 'agm') throw new VerdictInputError('type', `type must be 'flooded' or 'agm'`);
  const { percent, interpolated, text } = locate(volts, SOC_TABLES[type]);
  return { percent, interpolated, note: `${text} ${SOURCE[type]} ${REST_NOTE}` };
}
