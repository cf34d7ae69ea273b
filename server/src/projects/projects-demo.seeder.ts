import type { ProjectRole } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { DEMO_ACCOUNTS } from '../seed/demo-accounts.js';
import type { DemoSeeder } from '../seed/demo-seeder.js';
import { UsersService } from '../users/users.service.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { ProjectEntity } from './project.entity.js';

/** The invented demo project (invented demo data: Brackenfold Semiconductor is a made-up design house). */
export const WRENMOSS_PROJECT = {
  name: 'Wrenmoss sensor front end',
  description:
    'Invented demo data. The analog front end of an invented battery-powered soil-moisture sensor by Brackenfold Semiconductor, a made-up design house: bias generator, two-stage amplifier and sleep switch on the invented BF180-G process.',
} as const;

/** Who is in the demo project; the admin is not a member (admins see every project anyway). */
const WRENMOSS_MEMBERS: ReadonlyArray<{ email: string; role: ProjectRole }> = [
  { email: DEMO_ACCOUNTS.designer.email, role: 'owner' },
  { email: DEMO_ACCOUNTS.reviewer.email, role: 'reviewer' },
  { email: DEMO_ACCOUNTS.viewer.email, role: 'viewer' },
];

/** After the demo users (0) and processes (10); the sheets follow (30). */
@Injectable()
export class ProjectsDemoSeeder implements DemoSeeder {
  readonly order = 20;

  constructor(private readonly users: UsersService) {}

  async seed(manager: EntityManager): Promise<void> {
    const designer = (await this.users.findByEmail(DEMO_ACCOUNTS.designer.email, manager))!;
    const project = await manager.getRepository(ProjectEntity).save(manager.create(ProjectEntity, { ...WRENMOSS_PROJECT, createdById: designer.id }));
    for (const member of WRENMOSS_MEMBERS) {
      const user = (await this.users.findByEmail(member.email, manager))!;
      await manager.getRepository(ProjectMemberEntity).insert({ projectId: project.id, userId: user.id, role: member.role });
    }
  }
}
