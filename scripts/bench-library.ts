/**
 * The invented benchmark library of a million specs, as a pure function of the spec's
 * number: 40 makes × 500 models × 50 specs, with the trade's component and parameter names
 * (front and rear coils, pickups, stators, sensors, relays…), displacements, variants and
 * model years. Every name is invented. docAt(i) gives spec i (1-based) without holding the
 * library, so the loader and the query mix read the same specs.
 */
export const SPECS_PER_MODEL = 50;

export const MAKES = [
  'Kestrel Moto',
  'Corvane',
  'Marrowdown',
  'Quillback',
  'Tarnhollow',
  'Vellum Works',
  'Brackenridge',
  'Osprine',
  'Halvard',
  'Ferrow',
  'Draystone',
  'Ulmara',
  'Penwick',
  'Sorrel',
  'Vantor',
  'Greyling',
  'Ashcombe',
  'Thalwen',
  'Rookmoor',
  'Ebbrook',
  'Calder Moto',
  'Nettleby',
  'Orvane',
  'Wexmoor',
  'Brisling',
  'Caddon',
  'Elstow',
  'Farrow',
  'Glenrith',
  'Hurst Motors',
  'Ivelmoor',
  'Jarrow',
  'Kilnsey',
  'Lowther',
  'Mardale',
  'Norrith',
  'Oxtane',
  'Pellan',
  'Quarrel',
  'Ravensend',
];
const FAMILIES = [
  'Trail',
  'Urban',
  'Ridge',
  'Drift',
  'Surge',
  'Vela',
  'Strale',
  'Moor',
  'Quill',
  'Fen',
  'Harrier',
  'Talon',
  'Brook',
  'Summit',
  'Dune',
  'Comet',
  'Falcon',
  'Tundra',
  'Scout',
  'Breaker',
  'Vireo',
  'Marlin',
  'Cobalt',
  'Ember',
  'Glider',
  'Nomad',
  'Rambler',
  'Sable',
  'Tempest',
  'Wren',
];
const DISPLACEMENTS = [50, 110, 125, 150, 200, 250, 300, 390, 450, 500, 650, 690, 750, 800, 900, 1000, 1200];
const SUFFIXES = ['', '', 'R', 'S', 'X', 'GT', 'Adventure', 'Sport', 'Classic'];
const VARIANTS = ['EU market', 'US market', 'AU market', 'carburettor', 'EFI', 'ABS', 'two-stroke', 'kick start'];

type Pair = [component: string, parameter: string, unit: string, kind: string, base: number];
const COMPONENT_PARAMS: [string, [string, string, string, number][]][] = [
  [
    'ignition coil — front',
    [
      ['primary winding resistance', 'Ω', 'resistance', 3],
      ['secondary winding resistance', 'kΩ', 'resistance', 12],
      ['primary peak voltage', 'V', 'voltage', 200],
    ],
  ],
  [
    'ignition coil — rear',
    [
      ['primary winding resistance', 'Ω', 'resistance', 3],
      ['secondary winding resistance', 'kΩ', 'resistance', 12],
    ],
  ],
  [
    'pickup coil',
    [
      ['pickup coil resistance', 'Ω', 'resistance', 480],
      ['pickup coil air gap', 'mm', 'length', 0.7],
      ['pickup coil peak voltage', 'V', 'voltage', 2],
    ],
  ],
  [
    'stator',
    [
      ['stator winding resistance', 'Ω', 'resistance', 0.4],
      ['stator insulation to ground', 'MΩ', 'resistance', 1],
      ['unloaded AC output voltage', 'V', 'voltage', 60],
    ],
  ],
  [
    'regulator / rectifier',
    [
      ['regulated voltage', 'V', 'voltage', 14.2],
      ['charging current', 'A', 'current', 12],
    ],
  ],
  [
    'battery',
    [
      ['rest voltage', 'V', 'voltage', 12.7],
      ['cranking voltage', 'V', 'voltage', 10],
    ],
  ],
  ['spark plug', [['electrode gap', 'mm', 'length', 0.8]]],
  ['spark plug cap', [['plug cap resistance', 'kΩ', 'resistance', 5]]],
  ['plug lead', [['lead resistance', 'kΩ', 'resistance', 1]]],
  ['main fuse', [['fuse rating', 'A', 'current', 30]]],
  [
    'starter relay',
    [
      ['coil resistance', 'Ω', 'resistance', 4],
      ['pick-up voltage', 'V', 'voltage', 8],
    ],
  ],
  [
    'starter motor',
    [
      ['brush length', 'mm', 'length', 10],
      ['no-load current', 'A', 'current', 40],
    ],
  ],
  [
    'fuel pump',
    [
      ['pump coil resistance', 'Ω', 'resistance', 1.5],
      ['supply voltage', 'V', 'voltage', 12.5],
    ],
  ],
  [
    'fuel injector',
    [
      ['injector coil resistance', 'Ω', 'resistance', 12],
      ['supply voltage', 'V', 'voltage', 12.5],
    ],
  ],
  [
    'throttle position sensor',
    [
      ['input voltage', 'V', 'voltage', 5],
      ['output voltage at idle', 'V', 'voltage', 0.6],
      ['track resistance', 'kΩ', 'resistance', 5],
    ],
  ],
  [
    'coolant temperature sensor',
    [
      ['resistance at 20 °C', 'kΩ', 'resistance', 2.5],
      ['resistance at 80 °C', 'Ω', 'resistance', 320],
    ],
  ],
  ['intake air temperature sensor', [['resistance at 20 °C', 'kΩ', 'resistance', 2.2]]],
  [
    'oxygen sensor',
    [
      ['heater resistance', 'Ω', 'resistance', 7],
      ['output voltage rich', 'V', 'voltage', 0.8],
    ],
  ],
  [
    'crankshaft position sensor',
    [
      ['sensor resistance', 'Ω', 'resistance', 600],
      ['sensor air gap', 'mm', 'length', 1],
    ],
  ],
  [
    'CDI unit',
    [
      ['supply voltage', 'V', 'voltage', 12.5],
      ['output peak voltage', 'V', 'voltage', 250],
    ],
  ],
  [
    'headlight',
    [
      ['bulb resistance', 'Ω', 'resistance', 0.4],
      ['supply voltage', 'V', 'voltage', 13],
    ],
  ],
  [
    'horn',
    [
      ['coil resistance', 'Ω', 'resistance', 1.2],
      ['current draw', 'A', 'current', 3],
    ],
  ],
  ['neutral switch', [['contact resistance', 'Ω', 'resistance', 0.5]]],
  ['side stand switch', [['contact resistance', 'Ω', 'resistance', 0.5]]],
  ['ignition switch', [['contact resistance', 'Ω', 'resistance', 0.3]]],
  [
    'cooling fan motor',
    [
      ['motor resistance', 'Ω', 'resistance', 1],
      ['current draw', 'A', 'current', 6],
    ],
  ],
  [
    'fuel level sender',
    [
      ['resistance full', 'Ω', 'resistance', 10],
      ['resistance empty', 'Ω', 'resistance', 90],
    ],
  ],
  [
    'speed sensor',
    [
      ['supply voltage', 'V', 'voltage', 5],
      ['sensor air gap', 'mm', 'length', 1],
    ],
  ],
];
export const PAIRS: Pair[] = COMPONENT_PARAMS.flatMap(([c, ps]) => ps.map(([p, u, k, b]) => [c, p, u, k, b] as Pair));

export type BenchModel = {
  index: number;
  make: string;
  name: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
};
export type BenchSpec = BenchModel & {
  specId: number;
  component: string;
  parameter: string;
  unit: string;
  kind: string;
  min: number;
  nominal: number;
  max: number;
};

export function modelAt(index: number): BenchModel {
  const make = MAKES[index % MAKES.length];
  const family = FAMILIES[(index * 7 + Math.floor(index / MAKES.length)) % FAMILIES.length];
  const cc = DISPLACEMENTS[(index * 13 + Math.floor(index / 97)) % DISPLACEMENTS.length];
  const suffix = SUFFIXES[(index * 5 + Math.floor(index / 211)) % SUFFIXES.length];
  const yearFrom = 1985 + ((index * 11) % 38);
  const span = index % 7;
  return {
    index,
    make,
    name: `${family} ${cc}${suffix ? ` ${suffix}` : ''}`,
    yearFrom,
    yearTo: span === 6 ? null : Math.min(2026, yearFrom + span),
    // The engine code makes every model's natural key unique.
    variant: `${VARIANTS[(index * 3) % VARIANTS.length]} E${index.toString(36).toUpperCase()}`,
  };
}

/** Spec i (1-based): model ⌊(i−1)/50⌋, and the 50 of the model's component/parameter pairs, rotated per model. */
export function docAt(i: number): BenchSpec {
  const model = modelAt(Math.floor((i - 1) / SPECS_PER_MODEL));
  const k = (i - 1) % SPECS_PER_MODEL;
  const [component, parameter, unit, kind, base] = PAIRS[(k + model.index * 3) % PAIRS.length];
  const nominal = Number((base * (1 + ((model.index % 11) - 5) / 100)).toPrecision(3));
  return {
    ...model,
    specId: i,
    component,
    parameter,
    unit,
    kind,
    min: Number((nominal * 0.9).toPrecision(3)),
    nominal,
    max: Number((nominal * 1.1).toPrecision(3)),
  };
}
