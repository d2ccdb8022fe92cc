/**
 * The trade's synonyms (DESIGN §4), shared by the search and the parameter classifier. A
 * spec whose component or parameter contains one phrase of a group is also found by every
 * other phrase of that group, and is classified as if it used any of them.
 */
export const SYNONYM_GROUPS: string[][] = [
  ['pickup coil', 'pulse generator', 'pulser', 'pulser coil', 'trigger coil', 'crank sensor'],
  ['plug lead', 'ht lead', 'spark plug wire', 'plug wire', 'high tension lead'],
  ['electrode gap', 'plug gap', 'spark plug gap'],
  ['rest voltage', 'open-circuit voltage', 'open circuit voltage', 'ocv', 'resting voltage'],
  ['stator', 'charging coil', 'alternator winding', 'generator coil'],
  ['resistor cap', 'plug cap', 'suppressor cap', 'spark plug cap'],
  ['regulated voltage', 'charging voltage', 'regulator output'],
  ['primary winding', 'primary'],
  ['secondary winding', 'secondary'],
  ['fuse rating', 'fuse'],
];

/** Lower case, words only: hyphens and punctuation become single spaces. */
export const normalisePhrase = (s: string) =>
  s
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, ' ')
    .trim();

/** Each group's phrases normalised and padded once (the import classifies every row with them). */
const PADDED_GROUPS = SYNONYM_GROUPS.map((group) => ({ group, phrases: group.map((p) => ` ${normalisePhrase(p)} `) }));

/** The groups with a phrase that `text` contains as whole words. */
export function synonymGroupsIn(text: string): string[][] {
  const padded = ` ${normalisePhrase(text)} `;
  return PADDED_GROUPS.filter(({ phrases }) => phrases.some((p) => padded.includes(p))).map(({ group }) => group);
}

/** `text` with every synonym of the phrases it contains, each normalised (for matching, not for showing). */
export function withSynonyms(text: string): string {
  return [normalisePhrase(text), ...synonymGroupsIn(text).flat().map(normalisePhrase)].join(' | ');
}
