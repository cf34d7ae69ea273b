import type { CreateProjectRequest, Project, ProjectRole, UpdateProjectRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { runInTransaction } from '../database/run-in-transaction.js';
import { SheetEntity } from '../sheets/sheet.entity.js';
import type { UserEntity } from '../users/user.entity.js';
import { projectNotFound, type ProjectAccess } from './project-access.service.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { toProject, type ProjectCounts } from './project-response.js';
import { ProjectEntity } from './project.entity.js';
import { assertVersion } from './stale-edit.js';

/** Projects: a user's list, create (the creator becomes owner), read, rename. Callers check access. */
@Injectable()
export class ProjectsService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** The projects the user is a member of; every project for admins. By name. */
  async list(user: UserEntity): Promise<Project[]> {
    const memberships = await this.dataSource.getRepository(ProjectMemberEntity).findBy({ userId: user.id });
    const roles = new Map(memberships.map((m) => [m.projectId, m.role]));
    const query = this.dataSource.getRepository(ProjectEntity).createQueryBuilder('project').leftJoinAndSelect('project.createdBy', 'createdBy').orderBy('project.name', 'ASC');
    if (user.role !== 'admin') {
      if (roles.size === 0) return [];
      query.where('project.id IN (:...ids)', { ids: [...roles.keys()] });
    }
    const projects = await query.getMany();
    const counts = await this.counts(this.dataSource.manager, projects.map((p) => p.id));
    return projects.map((project) => toProject(project, roles.get(project.id) ?? null, counts.get(project.id)!));
  }

  async create(request: CreateProjectRequest, creator: UserEntity): Promise<Project> {
    const id = await runInTransaction(this.dataSource, async (manager) => {
      const project = await manager.getRepository(ProjectEntity).save(manager.create(ProjectEntity, { ...request, createdById: creator.id }));
      await manager.getRepository(ProjectMemberEntity).insert({ projectId: project.id, userId: creator.id, role: 'owner' });
      return project.id;
    });
    return this.get(id, 'owner');
  }

  async get(id: string, myRole: ProjectRole | null, manager: EntityManager = this.dataSource.manager): Promise<Project> {
    const project = await manager.getRepository(ProjectEntity).findOne({ where: { id }, relations: { createdBy: true } });
    if (!project) throw projectNotFound();
    const counts = await this.counts(manager, [id]);
    return toProject(project, myRole, counts.get(id)!);
  }

  /** Name and description; 409 STALE_EDIT (nothing written) when `version` is not the stored one. */
  async update(access: ProjectAccess, request: UpdateProjectRequest): Promise<Project> {
    await runInTransaction(this.dataSource, async (manager) => {
      const projects = manager.getRepository(ProjectEntity);
      const project = await projects.findOneBy({ id: access.projectId });
      if (!project) throw projectNotFound();
      assertVersion('project', project, request.version);
      const { version: _edited, ...change } = request;
      await projects.save(Object.assign(project, change, { version: project.version + 1 }));
    });
    return this.get(access.projectId, access.role);
  }

  private async counts(manager: EntityManager, ids: string[]): Promise<Map<string, ProjectCounts>> {
    const counts = new Map(ids.map((id) => [id, { memberCount: 0, sheetCount: 0 }]));
    if (ids.length === 0) return counts;
    for (const [entity, key] of [[ProjectMemberEntity, 'memberCount'], [SheetEntity, 'sheetCount']] as const) {
      const rows: Array<{ projectId: string; count: number }> = await manager
        .getRepository<{ projectId: string }>(entity)
        .createQueryBuilder('row')
        .select('row.projectId', 'projectId')
        .addSelect('COUNT(*)', 'count')
        .where('row.projectId IN (:...ids)', { ids })
        .groupBy('row.projectId')
        .getRawMany();
      for (const row of rows) counts.get(row.projectId)![key] = Number(row.count);
    }
    return counts;
  }
}
