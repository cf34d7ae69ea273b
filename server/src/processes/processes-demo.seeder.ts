import { DEMO_DATA_NOTICE, DEMO_PROCESSES } from '@channelwright/shared/device';
import type { ModelCardMapping } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import type { EntityManager } from 'typeorm';
import { registeredUnder } from '../common/extension-points.js';
import { DEMO_ACCOUNTS } from '../seed/demo-accounts.js';
import type { DemoSeeder } from '../seed/demo-seeder.js';
import { UsersService } from '../users/users.service.js';
import { readModelCard } from './model-card/stored-card.js';
import { ProcessWriter } from './process-writes.js';

/** Node classes of the invented demo processes (invented demo data, not any foundry's process). */
const DEMO_NODE_CLASSES: Readonly<Record<string, string>> = { 'BF180-G': '180 nm', 'BF130-G': '130 nm' };

/**
 * The invented model cards of the demo processes, by process name: the characterisation module, which keeps the
 * cards, registers one under DEMO_MODEL_CARDS (the library knows no characterisation).
 */
export interface DemoModelCards {
  cardFor(processName: string): { text: string; mapping: ModelCardMapping } | null;
}
export const DEMO_MODEL_CARDS = Symbol('DEMO_MODEL_CARDS');

/** The invented BF180-G and BF130-G profiles, created by the demo admin, after the demo users, each with its invented model card when one is registered. */
@Injectable()
export class ProcessesDemoSeeder implements DemoSeeder {
  readonly order = 10;

  constructor(
    private readonly writer: ProcessWriter,
    private readonly users: UsersService,
    private readonly moduleRef: ModuleRef,
  ) {}

  async seed(manager: EntityManager): Promise<void> {
    const admin = await this.users.findByEmail(DEMO_ACCOUNTS.admin.email, manager);
    const cards = registeredUnder<DemoModelCards>(this.moduleRef, DEMO_MODEL_CARDS);
    for (const definition of DEMO_PROCESSES) {
      const demoCard = cards.map((source) => source.cardFor(definition.name)).find((card) => card !== null);
      const card = demoCard ? readModelCard(demoCard.text, demoCard.mapping, definition) : null;
      await this.writer.insertProfile(
        manager,
        { definition, nodeClass: DEMO_NODE_CLASSES[definition.name] ?? '', message: DEMO_DATA_NOTICE, demoData: true, card },
        admin,
        'definition.name',
      );
    }
  }
}
