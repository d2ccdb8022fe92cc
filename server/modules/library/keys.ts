/**
 * Natural keys of the library: trimmed, whitespace-folded and lower-cased, so that
 * 'Ignition Coil  (rear)' and 'ignition coil (rear)' are the same component.
 */
export function foldKey(text: string): string {
  return text.trim().replace(/\s+/g, ' ').toLowerCase();
}

export const makeKey = (make: string) => foldKey(make);

export const modelKey = (m: {
  make: string;
  model: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
}) =>
  [m.make, m.model, String(m.yearFrom), m.yearTo === null ? '' : String(m.yearTo), m.variant].map(foldKey).join('|');

export const sourceKey = (s: { title: string; edition: string }) => `${foldKey(s.title)}|${foldKey(s.edition)}`;
