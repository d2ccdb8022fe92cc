/**
 * The trade's synonyms (DESIGN §4). A spec whose component or parameter contains one
 * phrase of a group is also found by every other phrase of that group.
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
