import { DEMO_DATA_NOTICE, DEMO_PROCESSES } from '@channelwright/shared/device';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { DEMO_ACCOUNTS } from '../seed/demo-accounts.js';
import type { DemoSeeder } from '../seed/demo-seeder.js';
import { UsersService } from '../users/users.service.js';
import { ProcessWriter } from './process-writes.js';

/** Node classes of the invented demo processes (invented demo data, not any foundry's process). */
const DEMO_NODE_CLASSES: Readonly<Record<string, string>> = { 'BF180-G': '180 nm', 'BF130-G': '130 nm' };

/** The invented BF180-G and BF130-G profiles, created by the demo admin, after the demo users. */
@Injectable()
export class ProcessesDemoSeeder implements DemoSeeder {
  readonly order = 10;

  constructor(
    private readonly writer: ProcessWriter,
    private readonly users: UsersService,
  ) {}

  async seed(manager: EntityManager): Promise<void> {
    const admin = await this.users.findByEmail(DEMO_ACCOUNTS.admin.email, manager);
    for (const definition of DEMO_PROCESSES) {
      await this.writer.insertProfile(
        manager,
        { definition, nodeClass: DEMO_NODE_CLASSES[definition.name] ?? '', message: DEMO_DATA_NOTICE, demoData: true },
        admin,
        'definition.name',
      );
    }
  }
}
