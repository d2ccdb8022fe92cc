import type request from 'supertest';

/** Asserts an RFC 9457 problem-details answer with this status (and code), and no leaked internals. */
export function expectProblem(res: request.Response, status: number, code?: string) {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
  expect(res.body).toMatchObject({
    status,
    title: expect.any(String),
    detail: expect.any(String),
    ...(code ? { code } : {}),
  });
  expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+|SELECT |ER_[A-Z_]+/);
}
