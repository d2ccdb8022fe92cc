import type { ModelRefDto } from '../../lib/contracts/library';

/** 'Kestrel Moto 900 Trail (2016–2021, EU)' */
export function modelTitle(m: ModelRefDto): string {
  const years = m.yearTo === null ? `${m.yearFrom}–` : m.yearTo === m.yearFrom ? `${m.yearFrom}` : `${m.yearFrom}–${m.yearTo}`;
  return `${m.make.name} ${m.name} (${years}${m.variant ? `, ${m.variant}` : ''})`;
}
