import { batteryStateOfCharge, VerdictInputError } from '@/lib/verdict';

describe('batteryStateOfCharge', () => {
  // Source: Battery Council International table for flooded batteries at 80 °F (26.7 °C),
  // as reproduced in battery makers' literature (REFERENCES §5) [quoted].
  it.each([
    [12.65, 100],
    [12.45, 75],
    [12.24, 50],
    [12.06, 25],
    [11.89, 0],
  ])('flooded: %d V is exactly %d %% (a table row, not interpolated)', (volts, percent) => {
    expect(batteryStateOfCharge(volts, 'flooded')).toMatchObject({ percent, interpolated: false });
  });

  // Source: a battery maker's AGM FAQ, not a standards body (REFERENCES §5) [quoted]; its 100 % row is
  // 12.80–12.90 V and 12.80 V is used as the row.
  it.each([
    [12.8, 100],
    [12.6, 75],
    [12.3, 50],
    [12.0, 25],
    [11.8, 0],
  ])('AGM: %d V is exactly %d %%', (volts, percent) => {
    expect(batteryStateOfCharge(volts, 'agm')).toMatchObject({ percent, interpolated: false });
  });

  // [computed] by linear interpolation between the quoted BCI rows 12.45 V (75 %) and 12.65 V (100 %).
  it('flooded: 12.55 V is interpolated between the 75 % and 100 % rows and says so', () => {
    const expected = 75 + ((12.55 - 12.45) / (12.65 - 12.45)) * (100 - 75);
    const soc = batteryStateOfCharge(12.55, 'flooded');
    expect(soc.percent).toBeCloseTo(expected, 10);
    expect(soc.percent).toBeCloseTo(87.5, 10);
    expect(soc.interpolated).toBe(true);
    expect(soc.note).toMatch(
      /between the 12\.45 V \(75 %\) and 12\.65 V \(100 %\) rows: interpolated linearly to 87\.5 %/,
    );
  });

  // [computed] between the quoted AGM rows 12.00 V (25 %) and 12.30 V (50 %).
  it('AGM: 12.15 V is interpolated to 37.5 %', () => {
    const expected = 25 + ((12.15 - 12.0) / (12.3 - 12.0)) * (50 - 25);
    expect(batteryStateOfCharge(12.15, 'agm')).toMatchObject({
      percent: expect.closeTo(expected, 10),
      interpolated: true,
    });
  });

  it.each([
    [12.9, 'flooded', 100, /above the 100 % row \(12\.65 V\)/],
    [12.85, 'agm', 100, /above the 100 % row \(12\.8 V\)/],
    [11.5, 'flooded', 0, /below the 0 % row \(11\.89 V\)/],
    [0, 'agm', 0, /below the 0 % row/],
  ] as const)('%d V (%s) is clamped to %d %% with a note', (volts, type, percent, note) => {
    const soc = batteryStateOfCharge(volts, type);
    expect(soc).toMatchObject({ percent, interpolated: false });
    expect(soc.note).toMatch(note);
  });

  // Source: battery makers' test procedures (REFERENCES §5) [quoted]: rest at least 6 h, preferably 24 h.
  it.each([
    [12.65, 'flooded'],
    [12.4, 'agm'],
  ] as const)('every answer (%d V, %s) carries the rest note', (volts, type) => {
    expect(batteryStateOfCharge(volts, type).note).toMatch(/at least 6 h, preferably 24 h/);
  });

  it('the flooded note names the 80 °F table', () => {
    expect(batteryStateOfCharge(12.3, 'flooded').note).toMatch(/80 °F \(26\.7 °C\)/);
  });

  it.each([
    [Number.NaN, 'flooded', 'volts'],
    [Number.POSITIVE_INFINITY, 'agm', 'volts'],
    [12.4, 'gel', 'type'],
  ])('when given %d V of type %s, throws VerdictInputError on %s', (volts, type, field) => {
    expect(() => batteryStateOfCharge(volts, type as 'agm')).toThrow(VerdictInputError);
    expect(() => batteryStateOfCharge(volts, type as 'agm')).toThrow(expect.objectContaining({ field }));
  });
});
