/** lib/plans: the graph rules, which models a plan fits, and which way a run goes. */
import { readFileSync } from 'fs';
import { join } from 'path';
import { decodeCsv, validateSpecCsv } from '@/lib/csv';
import { PlanFile, type PlanStep } from '@/lib/contracts/plans';
import { appliesTo, findComponent, fitProblems, type ModelParts } from '@/lib/plans/applicability';
import { stepAfter, targetFor } from '@/lib/plans/branching';
import { connectorCells } from '@/lib/plans/connector';
import { planProblems } from '@/lib/plans/validate';
import { groupBySystem, systemOf } from '@/lib/specs/systems';

const demo = PlanFile.parse(JSON.parse(readFileSync(join(__dirname, '../../data/demo-plans.json'), 'utf8')));
const noSpark = demo.plans.find((p) => p.title.startsWith('No spark'))!;
const end = { finding: { part: 'x', advice: 'y' } };
const step = (
  id: string,
  next: PlanStep['next'],
  check: PlanStep['check'] = { kind: 'limits', limits: { max: 1, unit: 'Ω' } },
): PlanStep => ({
  id,
  title: id,
  instructions: 'i',
  preconditions: [],
  cautions: [],
  testPoint: { text: 't' },
  check,
  next,
});

describe('data/demo-plan-parts.csv (the parts the demo plans name)', () => {
  it('validates in the import format with no rejected rows, and gives the stator AC output its meter mode', () => {
    const result = validateSpecCsv(decodeCsv(readFileSync(join(__dirname, '../../data/demo-plan-parts.csv'))));
    expect(result.fileErrors).toEqual([]);
    expect(result.rejected).toEqual([]);
    const ac = result.accepted.map((a) => a.row).find((r) => r.parameter === 'AC output, 5000 rpm');
    expect(ac).toMatchObject({ component: 'Stator', mode: 'ac_voltage', engineRpm: 5000 });
  });

  it('has at least 10 connector faces in the demo plan file, each pin inside its grid', () => {
    expect(demo.connectors.length).toBeGreaterThanOrEqual(10);
  });
});

describe('planProblems', () => {
  it('finds no problem in any demo plan', () => {
    for (const p of demo.plans) expect([p.title, planProblems(p.steps)]).toEqual([p.title, []]);
  });

  it('finds a loop, a missing step, a duplicate id, an outcome with no branch, an unreachable step', () => {
    expect(
      planProblems([step('a', { pass: { step: 'b' }, fail: end }), step('b', { pass: { step: 'a' }, fail: end })]),
    ).toEqual([{ path: 'steps.1.next', message: expect.stringMatching(/leads back to "a"/) }]);
    expect(planProblems([step('a', { pass: { step: 'q' }, fail: end })])[0].path).toBe('steps.0.next.pass.step');
    expect(planProblems([step('a', { pass: end, fail: end }), step('a', { pass: end, fail: end })])[0].path).toBe(
      'steps.1.id',
    );
    expect(planProblems([step('a', { pass: end })])[0].path).toBe('steps.0.next.fail');
    expect(planProblems([step('a', { pass: end, fail: end }), step('b', { pass: end, fail: end })])).toEqual([
      { path: 'steps.1', message: expect.stringMatching(/never reached/) },
    ]);
  });

  it('asks an observation for a branch per choice, and refuses pass/fail on it', () => {
    const obs: PlanStep['check'] = {
      kind: 'observation',
      choices: [
        { id: 'yes', label: 'Yes' },
        { id: 'no', label: 'No' },
      ],
    };
    expect(planProblems([step('a', { yes: end, pass: end }, obs)]).map((p) => p.path)).toEqual([
      'steps.0.next.no',
      'steps.0.next.pass',
    ]);
  });
});

describe('applicability', () => {
  const parts = (names: string[]): ModelParts =>
    names.map((name, i) => ({ id: i, name, specs: [{ id: i, parameter: 'Rest voltage' }] }));
  const all = [
    'Battery',
    'Ignition fuse',
    'Ignition coil (rear)',
    'Pickup coil',
    'Spark plug',
    'Diode module',
    'Start relay',
    'Ignition control unit',
  ];

  it('matches a component by name, or by name before a bracketed qualifier', () => {
    expect(findComponent('ignition coil', parts(['Ignition coil (rear)']))?.name).toBe('Ignition coil (rear)');
    expect(findComponent('Ignition coil', parts(['Ignition coil switch']))).toBeNull();
  });

  it('a generic plan applies to a model with every component it names, not to one lacking one', () => {
    expect(appliesTo(noSpark.steps, parts(all))).toBe(true);
    expect(appliesTo(noSpark.steps, parts(all.filter((n) => n !== 'Diode module')))).toBe(false);
  });

  it('names the step and path of each missing component; a missing parameter only when strict', () => {
    const loose = fitProblems(noSpark.steps, parts(all.filter((n) => n !== 'Start relay')), false);
    expect(loose).toEqual([
      { path: 'steps.9.testPoint.component', message: expect.stringMatching(/Step "relay-diode"/) },
    ]);
    const strict = fitProblems(noSpark.steps, parts(all), true);
    expect(strict.map((p) => p.path)).toContain('steps.3.check.parameter');
  });
});

describe('branching', () => {
  const [battery] = noSpark.steps;
  const spark = noSpark.steps.find((s) => s.id === 'spark-test')!;

  it.each([
    ['pass', 'fuses'],
    ['marginal', null],
    ['fail', null],
    ['skip', 'fuses'],
  ])('battery %s → %s', (outcome, next) => {
    expect(stepAfter(noSpark.steps, battery, outcome)?.id ?? null).toBe(next);
  });

  it('a marginal with no branch of its own follows fail (to the finding); no spark at the tester goes on to the diodes', () => {
    expect(targetFor(battery, 'marginal')).toEqual(battery.next.fail);
    expect(stepAfter(noSpark.steps, spark, 'fail')?.id).toBe('diodes');
  });

  it('a pickup coil out of limits ends at the pickup coil finding', () => {
    const pickup = noSpark.steps.find((s) => s.id === 'pickup')!;
    expect(targetFor(pickup, 'fail')).toEqual({ finding: expect.objectContaining({ part: 'Pickup coil' }) });
  });
});

describe('systems', () => {
  it.each([
    ['Pickup coil', 'ignition'],
    ['Regulator/rectifier', 'charging'],
    ['Lighting coil', 'charging'],
    ['Starter relay', 'starting'],
    ['Fuel pump fuse', 'fuel'],
    ['Headlight fuse', 'lighting'],
    ['Fan fuse', 'other'],
  ])('%s is in %s', (name, system) => {
    expect(systemOf(name)).toBe(system);
  });

  it('groups in the trade order: ignition, charging, starting, fuel, lighting, other', () => {
    const groups = groupBySystem([
      { name: 'Headlight' },
      { name: 'Fan fuse' },
      { name: 'Stator' },
      { name: 'Spark plug' },
    ]);
    expect(groups.map((g) => g.system)).toEqual(['ignition', 'charging', 'lighting', 'other']);
  });
});

describe('connectorCells', () => {
  it('puts "pins 2 and 3 from the right, bottom row" of the demo diode module at pins 6 and 7', () => {
    const diode = demo.connectors.find((c) => c.component === 'Diode module')!.connector;
    const bottom = connectorCells(diode).filter((c) => c.row === 1);
    const fromRight = [...bottom].sort((a, b) => b.column - a.column).map((c) => c.number);
    expect(fromRight.slice(1, 3).sort()).toEqual([6, 7]);
    expect(noSpark.steps.find((s) => s.id === 'diodes')!.testPoint.pins).toEqual([6, 7]);
  });

  it('numbers right-to-left from the top right', () => {
    expect(connectorCells({ rows: 1, columns: 3, numbering: 'right-to-left' })).toEqual([
      { number: 1, row: 0, column: 2 },
      { number: 2, row: 0, column: 1 },
      { number: 3, row: 0, column: 0 },
    ]);
  });
});
