/**
 * route() (server/http/handler.ts) on a bare Express app: typed input, the order of
 * parsing, the answer's status, and the 400 validation_failed problem it shares with
 * every API route. No database.
 */
import express from 'express';
import request from 'supertest';
import { z } from 'zod';
import { route } from '@/server/http/handler';
import { AppError } from '@/server/errors/app-error';
import { errorHandler } from '@/server/middleware/error-handler';
import { expectProblem } from '../helpers/problems';

const Params = z.object({ id: z.coerce.number().int().positive() });
const Body = z.object({ name: z.string().min(1) });
const refuseAll: express.RequestHandler = () => {
  throw new AppError(415, 'unsupported_media_type', 'no');
};

function appWith(register: (r: express.Router) => void) {
  const app = express();
  app.use(express.json());
  const r = express.Router();
  register(r);
  app.use('/things', r);
  app.use(errorHandler);
  return app;
}

describe('route()', () => {
  it('hands the parsed params and body to the handler and answers its result as JSON', async () => {
    const app = appWith((r) =>
      r.patch(
        '/:id',
        route({ params: Params, body: Body }, ({ params, body }) => ({ id: params.id, name: body.name })),
      ),
    );
    const res = await request(app).patch('/things/7').send({ name: 'coil' }).expect(200);
    expect(res.body).toEqual({ id: 7, name: 'coil' });
  });

  it('when the body is invalid, answers 400 validation_failed with the field errors and skips the handler', async () => {
    const handler = jest.fn(() => ({}));
    const app = appWith((r) => r.post('/', route({ body: Body }, handler)));
    const res = await request(app).post('/things').send({ name: '' });
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.detail).toBe('The request body is not valid.');
    expect(res.body.errors).toEqual([{ path: 'name', message: expect.any(String) }]);
    expect(handler).not.toHaveBeenCalled();
  });

  it('parses params before the `use` middleware, and the body after it', async () => {
    const app = appWith((r) =>
      r.post(
        '/:id',
        route({ params: Params, use: [refuseAll], body: Body }, () => ({})),
      ),
    );
    const badId = await request(app).post('/things/x').send({});
    expectProblem(badId, 400, 'validation_failed');
    expect(badId.body.detail).toBe('The request params is not valid.');
    expectProblem(await request(app).post('/things/1').send({}), 415, 'unsupported_media_type');
  });

  it('with created, answers 201 and a Location under the mount path', async () => {
    const app = appWith((r) =>
      r.post(
        '/',
        route({ body: Body, created: true }, () => ({ id: 42 })),
      ),
    );
    const res = await request(app).post('/things').send({ name: 'stator' }).expect(201);
    expect(res.headers.location).toBe('/things/42');
  });

  it('when the handler reads the user on a request without one, answers 401', async () => {
    const app = appWith((r) =>
      r.get(
        '/',
        route({}, ({ user }) => ({ id: user.id })),
      ),
    );
    expectProblem(await request(app).get('/things'), 401, 'unauthorized');
  });
});
