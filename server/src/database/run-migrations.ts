// `npm run migrate -w server`: applies the pending migrations to DATA_DIR's database and exits.
// The server also runs them at start-up; this is for upgrading a database without starting it.
import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ConfigError } from '../config/config-error.js';
import { loadConfig } from '../config/load-config.js';
import { dataSourceOptions } from './data-source-options.js';

try {
  const config = loadConfig();
  const dataSource = await new DataSource(dataSourceOptions(config)).initialize();
  const applied = await dataSource.runMigrations({ transaction: 'each' });
  await dataSource.destroy();
  console.log(applied.length === 0 ? 'The database is up to date.' : `Applied: ${applied.map((m) => m.name).join(', ')}`);
} catch (error) {
  console.error(error instanceof ConfigError ? error.message : error);
  process.exit(1);
}
