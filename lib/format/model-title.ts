/** 'Kestrel Moto 900 Trail (2016–2021, EU)': how a model is named everywhere (screens, job sheets, proposals). */
export type NamedModel = {
  make: { name: string };
  name: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
};

export function modelTitle(m: NamedModel): string {
  const years =
    m.yearTo === null ? `${m.yearFrom}–` : m.yearTo === m.yearFrom ? `${m.yearFrom}` : `${m.yearFrom}–${m.yearTo}`;
  return `${m.make.name} ${m.name} (${years}${m.variant ? `, ${m.variant}` : ''})`;
}
