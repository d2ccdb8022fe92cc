/**
 * Issue 13 item 13: a wrong method on a known path answers 405 with Allow (RFC 9110
 * §15.5.6: "The origin server MUST generate an Allow header field in a 405 response"),
 * OPTIONS lists the methods (§9.3.7), and a request body in a charset or encoding the
 * server cannot read answers 415 saying so, not "malformed JSON?".
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { ROUTE_RULES } from '@/server/auth/route-rules';
import { expectProblem } from '../helpers/problems';

const app = createApp({ webDist: null });

const urlOf = (path: string) => path.replace(/:[a-zA-Z]+/g, '7');
const patternOf = (path: string) => new RegExp(`^${path.replace(/\./g, '\\.').replace(/:[a-zA-Z]+/g, '[^/]+')}$`);
/**
 * Each path of the access table (kept apart from the routers the server reads) as a URL,
 * with every method some rule allows on it: /api/corrections/summary is also /:id.
 */
const PATHS = [...new Set(Object.keys(ROUTE_RULES).map((k) => k.split(' ')[1]))].map((path) => {
  const url = urlOf(path);
  const methods = Object.keys(ROUTE_RULES)
    .map((k) => k.split(' '))
    .filter(([, p]) => patternOf(p).test(url))
    .flatMap(([m]) => (m === 'GET' ? ['GET', 'HEAD'] : [m]));
  return [path, [...new Set(methods)].sort()] as const;
});
const allowOf = (res: request.Response) =>
  String(res.headers.allow ?? '')
    .split(/,\s*/)
    .sort();

describe('a wrong method on a known path', () => {
  it.each(PATHS)('%s answers 405 with Allow: %s', async (path, methods) => {
    const wrong = ['PUT', 'DELETE', 'PATCH', 'POST'].find((m) => !methods.includes(m))!;
    const res = await request(app)[wrong.toLowerCase() as 'put'](urlOf(path)).send({});
    expectProblem(res, 405, 'method_not_allowed');
    expect(allowOf(res)).toEqual(methods);
    expect(res.body.detail).toContain(wrong);
  });

  it('answers 405 before asking who is calling (no 401 for a method that is never allowed)', async () => {
    const res = await request(app).delete('/api/users/7');
    expectProblem(res, 405, 'method_not_allowed');
    expect(allowOf(res)).toEqual(['PATCH']);
  });

  it('matches paths as the router does: a trailing slash, another case', async () => {
    expect(allowOf(await request(app).put('/api/jobs/').expect(405))).toEqual(['GET', 'HEAD', 'POST']);
    expect(allowOf(await request(app).delete('/api/Specs/7/Revisions').expect(405))).toEqual(['GET', 'HEAD']);
  });

  it('a path the API does not have still answers 404', async () => {
    expectProblem(await request(app).get('/api/nothing-here'), 404, 'not_found');
    expectProblem(await request(app).delete('/api/specs/7/nothing'), 404, 'not_found');
  });

  it('HEAD on a GET route is not refused', async () => {
    const res = await request(app).head('/api/health');
    expect(res.status).not.toBe(405);
  });

  it('OPTIONS answers 204 with the allowed methods', async () => {
    const res = await request(app).options('/api/specs/7').expect(204);
    expect(allowOf(res)).toEqual(['GET', 'HEAD', 'PATCH']);
  });
});

describe('a body the server cannot read', () => {
  it('in a charset other than UTF-8 answers 415 naming the charset', async () => {
    const res = await request(app)
      .post('/api/verdicts')
      .set('Content-Type', 'application/json; charset=iso-8859-1')
      .send('{"reading":{"value":1,"unit":"V"}}');
    expectProblem(res, 415, 'unsupported_charset');
    expect(res.body.detail).toMatch(/iso-8859-1/i);
    expect(res.body.detail).toMatch(/UTF-8/);
    expect(res.body.detail).not.toMatch(/malformed/i);
  });

  it('in a content encoding the server does not take answers 415 naming it', async () => {
    const res = await request(app)
      .post('/api/verdicts')
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'compress')
      .send('{"reading":{"value":1,"unit":"V"}}');
    expectProblem(res, 415, 'unsupported_encoding');
    expect(res.body.detail).toMatch(/compress/);
    expect(res.body.detail).not.toMatch(/malformed/i);
  });

  it('malformed JSON still answers 400 saying so', async () => {
    const res = await request(app).post('/api/verdicts').set('Content-Type', 'application/json').send('{"reading": ');
    expectProblem(res, 400, 'bad_request');
    expect(res.body.detail).toMatch(/malformed JSON/);
  });
});
