import { Router } from 'express';
import { IdParams } from '@/lib/contracts/library';
import { ConnectorBody } from '@/lib/contracts/plans';
import { route } from '@/server/http/handler';
import { setConnector } from './connector.service';

const put = route({ params: IdParams, body: ConnectorBody }, ({ params, body }) =>
  setConnector(params.id, body.connector),
);

/** Editors' connector faces, one per component (PUT with null removes it). */
export const connectorRouter = Router();

connectorRouter.put('/:id/connector', put);
