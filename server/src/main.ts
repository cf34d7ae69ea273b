import 'reflect-metadata';
import type { AddressInfo } from 'node:net';
import { createApp } from './app.factory.js';
import { AppConfigService } from './config/app-config.service.js';
import { ConfigError } from './config/config-error.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './seed/demo-accounts.js';

async function main(): Promise<void> {
  const app = await createApp();
  app.enableShutdownHooks();
  const config = app.get(AppConfigService);
  await app.listen(config.port);
  const { port } = app.getHttpServer().address() as AddressInfo;

  const lines = [`Channelwright is running at http://localhost:${port}  (API docs: http://localhost:${port}/api/docs)`];
  if (config.seedDemo) {
    lines.push(`Demo accounts (invented demo data), all with the password "${DEMO_PASSWORD}":`);
    for (const account of Object.values(DEMO_ACCOUNTS)) lines.push(`  ${account.email.padEnd(30)} ${account.job}`);
  }
  console.log(lines.join('\n'));
}

main().catch((error: unknown) => {
  console.error(error instanceof ConfigError ? error.message : error);
  process.exit(1);
});
