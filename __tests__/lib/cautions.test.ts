import { cautionsFor } from '@/lib/safety/cautions';

describe('cautionsFor', () => {
  it.each([
    ['Ignition coil (rear)', 'Secondary winding resistance', 'high-voltage'],
    ['Plug lead', 'Resistance', 'high-voltage'],
    ['Stator', 'Winding resistance', 'charging'],
    ['Regulator / rectifier', 'Regulated voltage', 'charging'],
    ['Battery', 'Rest voltage', 'battery'],
  ])('%s / %s carries the %s caution', (component, parameter, id) => {
    expect(cautionsFor(component, parameter).notes.map((n) => n.id)).toContain(id);
  });

  it('a fuse rating carries no high-voltage caution but still defers to the maker’s manual', () => {
    const { notes, defer } = cautionsFor('Main fuse', 'Rating');
    expect(notes).toEqual([]);
    expect(defer).toMatch(/maker's service manual/);
  });

  it('the battery caution asks for a rest before the reading (battery makers’ test procedures: at least 6 h, preferably 24 h)', () => {
    // Source: REFERENCES §5, battery makers' test procedures [quoted]: rest at least 6 h, preferably 24 h.
    const battery = cautionsFor('Battery', 'Rest voltage').notes.find((n) => n.id === 'battery')!;
    expect(battery.lines.join(' ')).toMatch(/6 hours.*24 hours/);
  });
});
