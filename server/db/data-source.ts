import 'reflect-metadata';
import path from 'node:path';
import { DataSource, type DataSourceOptions } from 'typeorm';
import { config } from '../config';
import { QueryTimeoutLogger } from './query-timeout';
import { Make } from '../modules/library/make.entity';
import { VehicleModel } from '../modules/library/vehicle-model.entity';
import { Component } from '../modules/library/component.entity';
import { Source } from '../modules/library/source.entity';
import { Spec } from '../modules/specs/spec.entity';
import { SpecRevision } from '../modules/specs/spec-revision.entity';
import { ImportBatch } from '../modules/imports/import-batch.entity';
import { User } from '../modules/users/user.entity';
import { UserAudit } from '../modules/users/user-audit.entity';
import { RefreshToken } from '../modules/accounts/refresh-token.entity';
import { EmailToken } from '../modules/accounts/email-token.entity';
import { OutboxMessage } from '../modules/mail/outbox-message.entity';
import { Job } from '../modules/jobs/job.entity';
import { Reading } from '../modules/jobs/reading.entity';
import { Correction } from '../modules/corrections/correction.entity';
import { Plan } from '../modules/plans/plan.entity';
import { PlanRevision } from '../modules/plans/plan-revision.entity';
import { PlanRun } from '../modules/plans/plan-run.entity';
import { PlanRunResult } from '../modules/plans/plan-run-result.entity';
import { ComponentConnector } from '../modules/plans/component-connector.entity';

export const ENTITIES = [
  Make,
  VehicleModel,
  Component,
  Source,
  Spec,
  SpecRevision,
  ImportBatch,
  User,
  UserAudit,
  RefreshToken,
  EmailToken,
  OutboxMessage,
  Job,
  Reading,
  Correction,
  Plan,
  PlanRevision,
  PlanRun,
  PlanRunResult,
  ComponentConnector,
];

export function dataSourceOptions(database = config.DB_NAME): DataSourceOptions {
  return {
    type: 'mariadb',
    host: config.DB_HOST,
    port: config.DB_PORT,
    username: config.DB_USER,
    password: config.DB_PASSWORD,
    database,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    synchronize: false,
    migrationsRun: false,
    entities: ENTITIES,
    // .ts under ts-jest and tsx, .js once compiled.
    migrations: [path.join(__dirname, 'migrations', '*.{ts,js}').replace(/\\/g, '/')],
    // Every query is bounded (see query-timeout.ts); so is opening a connection.
    enableQueryTimeout: true,
    maxQueryExecutionTime: config.DB_QUERY_TIMEOUT_MS,
    logger: new QueryTimeoutLogger(),
    extra: { connectionLimit: config.DB_POOL_SIZE, connectTimeout: 5000, enableKeepAlive: true },
  };
}

/** The application's one DataSource (the TypeORM CLI reads this export too). */
export const AppDataSource = new DataSource(dataSourceOptions());
