import {
  EDITABLE_FIELDS,
  FIELD_LABEL,
  IMPORTED_FIELDS,
  REVIEWED_FIELDS,
  SNAPSHOT_FIELDS,
  SPEC_FIELDS,
  type SpecValues,
} from '@/lib/contracts/spec-fields';
import { diffSnapshots, pickValues, snapshotOfSpec, valuesOfSnapshot } from '@/lib/contracts/spec-snapshot';

const VALUES: SpecValues = {
  parameter: 'primary winding resistance',
  min: 2.9,
  nominal: 3.2,
  max: 3.5,
  unit: 'Ω',
  mode: null,
  nearLimit: null,
  engineRpm: null,
  refTempC: 20,
  material: 'copper',
  testPoints: 'orange/white to ground',
  conditions: null,
  notes: null,
  sourceId: 7,
  sourcePage: '7-12',
  status: 'published',
};
const SOURCE = { id: 7, title: 'Service Manual 900', edition: '3rd edition' };

describe('SPEC_FIELDS', () => {
  it('lists each field once, with a label', () => {
    const keys = SPEC_FIELDS.map((f) => f.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const f of SPEC_FIELDS) expect(FIELD_LABEL[f.key]).toBe(f.label);
  });

  it('derives the history order the revision diffs have always used', () => {
    expect(SNAPSHOT_FIELDS).toEqual([
      'parameter', 'min', 'nominal', 'max', 'unit', 'mode', 'nearLimit', 'engineRpm', 'refTempC', 'material',
      'testPoints', 'conditions', 'notes', 'sourceTitle', 'sourceEdition', 'sourcePage', 'status',
    ]); // prettier-ignore
  });

  it('derives the editable, imported and reviewed subsets', () => {
    expect(EDITABLE_FIELDS).toEqual([
      'parameter', 'min', 'nominal', 'max', 'unit', 'mode', 'nearLimit', 'engineRpm', 'refTempC', 'material',
      'testPoints', 'conditions', 'notes', 'status',
    ]); // prettier-ignore
    expect(IMPORTED_FIELDS).not.toContain('parameter');
    expect(IMPORTED_FIELDS).not.toContain('status');
    expect(REVIEWED_FIELDS).toEqual([
      'min',
      'nominal',
      'max',
      'unit',
      'mode',
      'nearLimit',
      'engineRpm',
      'refTempC',
      'material',
      'testPoints',
      'conditions',
    ]);
  });
});

describe('snapshotOfSpec', () => {
  it('adds the cited source and keeps the stored key order', () => {
    const s = snapshotOfSpec(VALUES, SOURCE);
    expect(s).toMatchObject({ sourceId: 7, sourceTitle: 'Service Manual 900', sourceEdition: '3rd edition' });
    expect(Object.keys(s).slice(-6)).toEqual([
      'notes', 'sourceId', 'sourceTitle', 'sourceEdition', 'sourcePage', 'status',
    ]); // prettier-ignore
  });

  it('without a source, sets the source fields to null', () => {
    expect(snapshotOfSpec(VALUES, null)).toMatchObject({ sourceId: null, sourceTitle: null, sourceEdition: null });
  });
});

describe('diffSnapshots', () => {
  it('lists only the fields that differ, treating empty text as no value', () => {
    const before = snapshotOfSpec(VALUES, SOURCE);
    const after = { ...before, max: 3.7, conditions: '', sourceEdition: '4th edition' };
    expect(diffSnapshots(before, after)).toEqual([
      { field: 'max', before: 3.5, after: 3.7 },
      { field: 'sourceEdition', before: '3rd edition', after: '4th edition' },
    ]);
  });

  it('against nothing (a first revision), lists every field that has a value', () => {
    const fields = diffSnapshots(null, snapshotOfSpec(VALUES, SOURCE)).map((c) => c.field);
    expect(fields).not.toContain('conditions');
    expect(fields).toContain('sourceTitle');
    expect(fields).toHaveLength(12);
  });
});

describe('valuesOfSnapshot and pickValues', () => {
  it('a revert to an old snapshot keeps the required fields it lacks and clears the rest', () => {
    const current = { ...VALUES, notes: 'keep dry' };
    const v = valuesOfSnapshot({ min: 1, unit: 'kΩ' }, current);
    expect(v).toMatchObject({ parameter: VALUES.parameter, material: 'copper', status: 'published', unit: 'kΩ' });
    expect(v).toMatchObject({ min: 1, max: null, notes: null, sourceId: null });
  });

  it('picks the value fields only, empty text as null', () => {
    const v = pickValues({ ...VALUES, testPoints: '', extra: 1 } as SpecValues);
    expect(v.testPoints).toBeNull();
    expect(Object.keys(v)).not.toContain('extra');
    expect(Object.keys(v).sort()).toEqual(Object.keys(VALUES).sort());
  });
});
