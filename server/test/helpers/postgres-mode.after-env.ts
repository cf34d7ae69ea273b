import { dropTestDatabases } from './test-database.js';

// setupFilesAfterEnv of jest.postgres.config.js: the databases a test file made go when it ends, also those of servers
// it restarted on kept data.
afterAll(() => dropTestDatabases());
