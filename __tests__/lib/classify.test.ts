import {
  cautionCategories,
  cautionCategoriesForMode,
  defaultMaterial,
  expectedKind,
  isRestVoltage,
} from '@/lib/specs/classify';
import { synonymGroupsIn } from '@/lib/specs/synonyms';

describe('expectedKind', () => {
  it.each([
    ['primary winding resistance', 'resistance'],
    ['Secondary Winding Resistance', 'resistance'],
    ['electrode gap', 'length'],
    ['plug gap', 'length'],
    ['pickup air gap', 'length'],
    ['rest voltage', 'voltage'],
    ['charging voltage', 'voltage'],
    ['open-circuit voltage', 'voltage'],
    ['peak voltage', 'voltage'],
    ['fuse rating', 'current'],
    ['current draw', 'current'],
    ['charging current', 'current'],
    ['continuity', null],
    ['diode direction', null],
    // Through the search's synonyms (lib/specs/synonyms.ts): OCV is the rest voltage.
    ['OCV', 'voltage'],
    ['regulator output', 'voltage'],
    // The wording decides before any synonym: a current named after the regulator stays a current.
    ['regulator output current', 'current'],
  ])('%s → %s', (parameter, kind) => {
    expect(expectedKind(parameter)).toBe(kind);
  });
});

describe('defaultMaterial', () => {
  it.each([
    ['primary winding resistance', 'copper'],
    ['pulser coil resistance', 'copper'],
    ['plug cap resistance', 'none'],
    ['resistor lead resistance', 'none'],
    // Not from synonyms: a crank sensor may be a Hall sensor rather than a winding.
    ['crank sensor resistance', 'none'],
  ] as const)('%s → %s', (parameter, material) => {
    expect(defaultMaterial(parameter, 'resistance')).toBe(material);
  });

  it('is none for any quantity but resistance, even for a winding', () => {
    expect(defaultMaterial('stator winding output voltage', 'voltage')).toBe('none');
  });
});

describe('isRestVoltage', () => {
  it.each(['Rest voltage', 'open-circuit voltage', 'Open circuit voltage', 'OCV', 'resting voltage'])(
    '%s is a rest voltage',
    (parameter) => expect(isRestVoltage(parameter)).toBe(true),
  );

  it.each(['charging voltage', 'peak voltage', 'interest voltage'])('%s is not', (parameter) =>
    expect(isRestVoltage(parameter)).toBe(false),
  );
});

describe('cautionCategories', () => {
  it.each([
    ['Ignition coil (rear)', 'Secondary winding resistance', ['high-voltage']],
    ['High tension lead', 'Resistance', ['high-voltage']],
    ['Suppressor cap', 'Resistance', ['high-voltage']],
    ['Battery', 'OCV', ['battery']],
    ['Regulator / rectifier', 'Regulated voltage', ['charging']],
    ['Main fuse', 'Rating', []],
  ])('%s / %s → %j', (component, parameter, categories) => {
    expect(cautionCategories(component, parameter)).toEqual(categories);
  });

  it('the calculator in voltage mode shows the charging and battery cautions, in other modes none', () => {
    expect(cautionCategoriesForMode('voltage')).toEqual(['charging', 'battery']);
    expect(cautionCategoriesForMode('resistance')).toEqual([]);
  });
});

describe('synonymGroupsIn', () => {
  it('matches whole words only, hyphens as spaces', () => {
    expect(synonymGroupsIn('pulse-generator coil')[0]).toContain('pickup coil');
    expect(synonymGroupsIn('pulsers')).toEqual([]);
  });
});
