import { databaseEngineOf } from './database-engine.js';

/**
 * The column types that are spelled differently on the two engines, chosen once when the entities are imported (their
 * decorators read them), from DATABASE_URL in the environment. The server checks at start that the engine it connects to
 * is this one (data-source-options.ts). The migrations create the same columns (migrations/dialect.ts).
 */
export const COLUMN_ENGINE = databaseEngineOf(process.env);

export const COLUMN_TYPES =
  COLUMN_ENGINE === 'postgres'
    ? ({ timestamp: 'timestamptz', bytes: 'bytea', double: 'double precision' } as const)
    : ({ timestamp: 'datetime', bytes: 'blob', double: 'real' } as const);
