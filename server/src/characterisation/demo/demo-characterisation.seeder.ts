import { DEMO_PROCESSES } from '@channelwright/shared/device';
import { parseModelCard } from '@channelwright/shared/model-card';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { AppConfigService } from '../../config/app-config.service.js';
import { ProcessesService } from '../../processes/processes.service.js';
import { DEMO_ACCOUNTS } from '../../seed/demo-accounts.js';
import type { DemoSeeder } from '../../seed/demo-seeder.js';
import { UsersService } from '../../users/users.service.js';
import { CharacterisationJobStore } from '../jobs/characterisation-job-store.js';
import { planCharacterisation, planHash } from '../jobs/characterisation-plan.js';

/**
 * The demo processes characterised at first start, in the background: a queued job per demo process with a card, over
 * the default grid, asked by the demo admin (DEMO_CHARACTERISATION; off in tests unless a test asks). After the
 * processes (10) and the project (20), before the sheets (30), which then say their devices wait for these tables.
 */
@Injectable()
export class DemoCharacterisationSeeder implements DemoSeeder {
  readonly order = 25;

  constructor(
    private readonly config: AppConfigService,
    private readonly processes: ProcessesService,
    private readonly users: UsersService,
    private readonly store: CharacterisationJobStore,
  ) {}

  async seed(manager: EntityManager): Promise<void> {
    if (!this.config.characterisation.demo) return;
    const admin = await this.users.findByEmail(DEMO_ACCOUNTS.admin.email, manager);
    for (const { name } of DEMO_PROCESSES) {
      const profileId = await this.processes.profileIdByName(name, manager);
      if (profileId === null) continue;
      const version = await this.processes.resolveDefinition(profileId, undefined, manager);
      if (!version.card) continue;
      const plan = planCharacterisation(version.definition, parseModelCard(version.card.text), version.card.mapping, { processId: profileId, grid: {} }, this.config.characterisation.maxPoints);
      await this.store.insertQueued({ processVersionId: version.versionId, gridHash: planHash(plan), plan, requestedById: admin?.id ?? null }, manager);
    }
  }
}
