import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { evaluateReading } from '@/lib/verdict';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { authHeader } from '../helpers/auth';

useTestDatabase();
const app = createApp({ webDist: null });
const post = (body: unknown) =>
  request(app)
    .post('/api/verdicts')
    .send(body as object);

describe('POST /api/verdicts', () => {
  it('a primary winding read 7.8 Ω through leads that read 3.9 Ω is 3.9 Ω, inside 3.57–4.83 Ω → pass', async () => {
    // common practice, no published source (trade fact stated in the issue)
    const res = await post({
      spec: { min: 3.57, max: 4.83, unit: 'ohm' },
      reading: { value: 7.8, unit: 'Ω' },
      leadResistance: { value: 3.9, unit: 'Ω' },
    }).expect(200);
    expect(res.body.verdict).toBe('pass');
    expect(res.body.value).toBeCloseTo(3.9, 10);
    expect(res.body.unit).toBe('Ω');
    expect(res.body.expandedUncertainty).toBeNull();
    expect(res.body.conformanceProbability).toBeNull();
    expect(res.body.steps.length).toBeGreaterThanOrEqual(2);
    for (const step of res.body.steps)
      expect(step).toMatchObject({ label: expect.any(String), value: expect.any(Number), unit: expect.any(String) });
  });

  it('a secondary winding read 22.8 kΩ through a 10 kΩ resistor cap is 12.8 kΩ, inside 10.7–14.5 kΩ → pass', async () => {
    // common practice, no published source (trade fact stated in the issue)
    const res = await post({
      spec: { min: 10.7, max: 14.5, unit: 'kohm' },
      reading: { value: 22.8, unit: 'kΩ' },
      seriesResistance: { value: 10, unit: 'kohm' },
    }).expect(200);
    expect(res.body).toMatchObject({ verdict: 'pass', unit: 'kΩ' });
    expect(res.body.value).toBeCloseTo(12.8, 10);
  });

  it('an electrode gap of 0.030 in is 0.762 mm, inside 0.7–0.8 mm → pass', async () => {
    // Source: NIST SP 811 (2008) Appendix B, 1 in = 25.4 mm exactly; limits: common practice, no published source
    const res = await post({ spec: { min: 0.7, max: 0.8, unit: 'mm' }, reading: { value: 0.03, unit: 'in' } }).expect(
      200,
    );
    expect(res.body.verdict).toBe('pass');
    expect(res.body.value).toBeCloseTo(0.03 * 25.4, 12);
  });

  it('with meter accuracy, answers U (k = 2) and p_c exactly as the shared engine does', async () => {
    // Source: Kwantlen Polytechnic University, Digital Multimeter Uncertainties: ±(2.5 % + 3 dgt) on 32.00 V, 0.01 V digit → a = 0.83 V
    const body = {
      spec: { min: 30, max: 34, unit: 'V' },
      reading: { value: 32, unit: 'V' },
      meter: { percent: 2.5, counts: 3, countValue: 0.01, unit: 'V' },
    };
    const res = await post(body).expect(200);
    // Source: JCGM 100:2008 §4.3.7 (u = a/√3, from memory, high confidence) and NIST TN 1297 §6.2 (U = 2u)
    expect(res.body.expandedUncertainty).toBeCloseTo((2 * 0.83) / Math.sqrt(3), 9);
    const engine = evaluateReading({
      spec: { min: 30, max: 34, unit: 'V' },
      reading: { value: 32, unit: 'V' },
      meter: { percent: 2.5, counts: 3, countValue: 0.01, unit: 'V' },
    });
    expect(res.body.verdict).toBe(engine.verdict);
    expect(res.body.conformanceProbability).toBeCloseTo(engine.conformanceProbability!, 12);
  });

  it('judges against a library spec given by id and says which version it used', async () => {
    const [spec] = await AppDataSource.query(
      "SELECT id, min_value, max_value, unit, version FROM specs WHERE quantity_kind = 'resistance' AND min_value IS NOT NULL AND max_value IS NOT NULL LIMIT 1",
    );
    const mid = (spec.min_value + spec.max_value) / 2;
    const res = await post({ specId: spec.id, reading: { value: mid, unit: spec.unit } }).expect(200);
    expect(res.body).toMatchObject({ verdict: 'pass', unit: spec.unit, specVersion: spec.version });
    const outside = await post({ specId: spec.id, reading: { value: spec.max_value * 3, unit: spec.unit } }).expect(
      200,
    );
    expect(outside.body.verdict).toBe('fail');
  });

  it('when the spec id is unknown, responds 404', async () => {
    const res = await post({ specId: 9_999_999, reading: { value: 1, unit: 'Ω' } });
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('not_found');
  });

  it.each([
    [
      'a unit of another quantity',
      { spec: { min: 0.7, max: 0.8, unit: 'mm' }, reading: { value: 3, unit: 'Ω' } },
      'reading.unit',
    ],
    [
      'an unknown unit',
      { spec: { min: 1, max: 2, unit: 'Ω' }, reading: { value: 1.5, unit: 'furlong' } },
      'reading.unit',
    ],
    [
      'a negative reading after the leads are subtracted',
      {
        spec: { min: 1, max: 2, unit: 'Ω' },
        reading: { value: 0.5, unit: 'Ω' },
        leadResistance: { value: 1.2, unit: 'Ω' },
      },
      'reading',
    ],
    [
      'a temperature below −40 °C',
      {
        spec: { min: 1, max: 2, unit: 'Ω', material: 'copper' },
        reading: { value: 1.5, unit: 'Ω' },
        temperatureC: -41,
      },
      'temperatureC',
    ],
    [
      'a temperature above 200 °C',
      {
        spec: { min: 1, max: 2, unit: 'Ω', material: 'copper' },
        reading: { value: 1.5, unit: 'Ω' },
        temperatureC: 201,
      },
      'temperatureC',
    ],
    ['min greater than max', { spec: { min: 3, max: 2, unit: 'Ω' }, reading: { value: 2.5, unit: 'Ω' } }, 'spec.min'],
  ])('when given %s, responds 422 naming the field', async (_name, body, field) => {
    const res = await post(body);
    expect(res.status).toBe(422);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(field);
  });

  it('when a number is not finite (1e999 in JSON), responds 422 naming the field', async () => {
    const res = await request(app)
      .post('/api/verdicts')
      .set('Content-Type', 'application/json')
      .send('{"spec":{"min":1,"max":2,"unit":"ohm"},"reading":{"value":1e999,"unit":"ohm"}}');
    expect(res.status).toBe(422);
    expect(res.body.errors[0].path).toMatch(/^reading/);
  });

  it.each([
    ['both specId and spec', { specId: 1, spec: { min: 1, unit: 'V' }, reading: { value: 1, unit: 'V' } }],
    ['neither specId nor spec', { reading: { value: 1, unit: 'V' } }],
    ['no reading', { spec: { min: 1, unit: 'V' } }],
    ['a reading value that is text', { spec: { min: 1, unit: 'V' }, reading: { value: '12', unit: 'V' } }],
    ['an unknown field', { spec: { min: 1, unit: 'V' }, reading: { value: 1, unit: 'V' }, extra: true }],
  ])('when the body has %s, responds 400 validation_failed', async (_name, body) => {
    const res = await post(body);
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
  });

  it('malformed JSON gets 400 problem details, never a stack trace', async () => {
    const res = await request(app).post('/api/verdicts').set('Content-Type', 'application/json').send('{"reading": ');
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(JSON.stringify(res.body)).not.toMatch(/SyntaxError|at JSON/);
  });
});

const paths = (res: request.Response) => res.body.errors.map((e: { path: string }) => e.path);

describe('POST /api/verdicts (issue 10 additions)', () => {
  it('answers the plain-words explanation beside the reason and the steps', async () => {
    const res = await post({ spec: { min: 12.5, unit: 'V' }, reading: { value: 12.8, unit: 'V' } }).expect(200);
    expect(res.body).toMatchObject({ verdict: 'pass', explanation: '12.8 V — above the minimum 12.5 V.' });
    expect(res.body.reason).toEqual(expect.any(String));
  });

  it('a negative DC voltage is judged as it reads', async () => {
    const res = await post({ spec: { min: -15, max: -10, unit: 'V' }, reading: { value: -12, unit: 'V' } }).expect(200);
    expect(res.body.verdict).toBe('pass');
  });

  it('takes spec.mode, spec.engineRpm and reading.mode, and refuses a reading taken in another mode on reading.mode', async () => {
    const spec = { min: 50, unit: 'V', mode: 'ac_voltage', engineRpm: 5000 };
    const ok = await post({ spec, reading: { value: 60, unit: 'V', mode: 'ac_voltage' } }).expect(200);
    expect(ok.body.steps[0].label).toBe('Meter reading on AC volts (rms), engine at 5 000 rpm');
    const res = await post({ spec, reading: { value: 60, unit: 'V', mode: 'dc_voltage' } });
    expectProblem(res, 422);
    expect(paths(res)).toContain('reading.mode');
  });

  it('an unknown mode is a 400 naming the field', async () => {
    const res = await post({ spec: { min: 1, unit: 'V', mode: 'ac_volts' }, reading: { value: 2, unit: 'V' } });
    expectProblem(res, 400);
  });

  it('takes spec.nearLimit in the spec unit', async () => {
    const body = { spec: { min: 12.5, unit: 'V', nearLimit: 0.2 }, reading: { value: 12.6, unit: 'V' } };
    const res = await post(body).expect(200);
    expect(res.body.verdict).toBe('marginal');
  });

  it.each([
    ['meter.percent 1e308', { percent: 1e308, counts: 2, countValue: 0.01, unit: 'Ω' }, 'meter.percent'],
    ['a countValue of 0 with counts', { percent: 1, counts: 2, countValue: 0, unit: 'Ω' }, 'meter.countValue'],
  ])('%s is a 422 naming the field, not a 500', async (_name, meter, field) => {
    const res = await post({ spec: { min: 2, max: 4, unit: 'Ω' }, reading: { value: 3, unit: 'Ω' }, meter });
    expectProblem(res, 422);
    expect(paths(res)).toContain(field);
  });

  it('a library peak-voltage spec is read in peak volts, inferred from its parameter', async () => {
    const [spec] = await AppDataSource.query(
      "SELECT id, unit, min_value AS min FROM specs WHERE parameter = 'Primary peak voltage' AND status = 'published' LIMIT 1",
    );
    const ok = await post({ specId: spec.id, reading: { value: spec.min * 2, unit: spec.unit, mode: 'peak_voltage' } });
    expect(ok.status).toBe(200);
    expect(ok.body.steps[0].label).toMatch(/^Meter reading on peak volts/);
    const res = await post({ specId: spec.id, reading: { value: spec.min * 2, unit: spec.unit, mode: 'dc_voltage' } });
    expectProblem(res, 422);
    expect(paths(res)).toContain('reading.mode');
  });

  it('a library spec’s stated mode, engine speed and near-limit band are used', async () => {
    const [spec] = await AppDataSource.query(
      "SELECT id FROM specs WHERE parameter = 'Rest voltage' AND min_value = 12.6 AND status = 'published' LIMIT 1",
    );
    await AppDataSource.query("UPDATE specs SET mode = 'dc_voltage', near_limit = 0.2, engine_rpm = 0 WHERE id = ?", [
      spec.id,
    ]);
    try {
      const near = await post({ specId: spec.id, reading: { value: 12.8, unit: 'V', mode: 'dc_voltage' } }).expect(200);
      expect(near.body.verdict).toBe('marginal'); // 12.8 − 12.6 = 0.2 exactly: on the stated band's edge
      expect(near.body.steps[0].label).toBe('Meter reading on DC volts, engine at 0 rpm');
      const wrong = await post({ specId: spec.id, reading: { value: 12.8, unit: 'V', mode: 'ac_voltage' } });
      expect(paths(wrong)).toContain('reading.mode');
    } finally {
      // The worker's database is shared by later files: put the demo row back.
      await AppDataSource.query('UPDATE specs SET mode = NULL, near_limit = NULL, engine_rpm = NULL WHERE id = ?', [
        spec.id,
      ]);
    }
  });

  it.each([
    ['a continuity check', { max: 0.5, unit: 'Ω', mode: 'continuity' }, { value: 0.1, unit: 'Ω', mode: 'continuity' }],
    [
      'a diode check',
      { min: 0.4, max: 0.8, unit: 'V', mode: 'diode_forward' },
      { value: 0.6, unit: 'V', mode: 'diode_forward' },
    ],
  ])('%s goes on a job like any other reading', async (label, spec, reading) => {
    const me = await authHeader('contributor', 'mode-checker');
    const job = (await request(app).post('/api/jobs').set(me).send({ machineLabel: 'Trail bike' }).expect(201)).body;
    const res = await request(app)
      .post(`/api/jobs/${job.id}/readings`)
      .set(me)
      .set('Idempotency-Key', `mode-${label.replace(/\W/g, '')}-${Date.now()}`)
      .send({ spec, reading, label })
      .expect(201);
    expect(res.body).toMatchObject({ verdict: 'pass', label });
    expect(res.body.inputs.reading.mode).toBe(reading.mode);
  });
});
