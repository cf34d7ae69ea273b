import type { CreateProjectRequest, Project, ProjectRole, UpdateProjectRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { InjectRepository } from '@nestjs/typeorm';
import { In, type EntityManager, type Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { registeredUnder } from '../common/extension-points.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { UsersService } from '../users/users.service.js';
import { projectNotFound, type ProjectAccess } from './project-access.service.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { toProject, type ProjectCounts } from './project-response.js';
import { PROJECT_SHEET_COUNTS, type ProjectSheetCounts } from './project-sheet-counts.js';
import { ProjectEntity } from './project.entity.js';
import { assertVersion } from './stale-edit.js';

/**
 * Projects: a user's list, create (the creator becomes owner), read, rename. Callers check access. Also the
 * read side other modules use: a user's projects, a project's name.
 */
@Injectable()
export class ProjectsService {
  constructor(
    @InjectRepository(ProjectEntity) private readonly projects: Repository<ProjectEntity>,
    @InjectRepository(ProjectMemberEntity) private readonly members: Repository<ProjectMemberEntity>,
    private readonly unitOfWork: UnitOfWork,
    private readonly users: UsersService,
    private readonly moduleRef: ModuleRef,
    private readonly audit: AuditService,
  ) {}

  /** The projects the user is a member of; every project for admins. By name. */
  async list(user: { id: string; role: string }): Promise<Project[]> {
    const memberships = await this.members.findBy({ userId: user.id });
    const roles = new Map(memberships.map((m) => [m.projectId, m.role]));
    if (user.role !== 'admin' && roles.size === 0) return [];
    const projects = await this.projects.find({ where: user.role === 'admin' ? {} : { id: In([...roles.keys()]) }, order: { name: 'ASC' } });
    return this.present(this.unitOfWork.manager, projects, (project) => roles.get(project.id) ?? null);
  }

  async create(request: CreateProjectRequest, creator: { id: string }): Promise<Project> {
    const id = await this.unitOfWork.run(async (manager) => {
      const project = await manager.getRepository(ProjectEntity).save(manager.create(ProjectEntity, { ...request, createdById: creator.id }));
      await manager.getRepository(ProjectMemberEntity).insert({ projectId: project.id, userId: creator.id, role: 'owner' });
      await this.audit.record(manager, {
        actor: creator,
        projectId: project.id,
        entityType: 'project',
        entityId: project.id,
        action: 'project.created',
        after: { name: project.name, description: project.description },
        summary: `Created the project ${project.name}`,
      });
      return project.id;
    });
    return this.get(id, 'owner');
  }

  async get(id: string, myRole: ProjectRole | null, manager: EntityManager = this.unitOfWork.manager): Promise<Project> {
    const project = await manager.getRepository(ProjectEntity).findOneBy({ id });
    if (!project) throw projectNotFound();
    const [shown] = await this.present(manager, [project], () => myRole);
    return shown;
  }

  /** Name and description; 409 STALE_EDIT (nothing written) when `version` is not the stored one. */
  async update(access: ProjectAccess, request: UpdateProjectRequest): Promise<Project> {
    await this.unitOfWork.run(async (manager) => {
      const projects = manager.getRepository(ProjectEntity);
      const project = await projects.findOneBy({ id: access.projectId });
      if (!project) throw projectNotFound();
      assertVersion('project', project, request.version);
      const { version: _edited, ...change } = request;
      const before = { name: project.name, description: project.description };
      await projects.save(Object.assign(project, change, { version: project.version + 1 }));
      await this.audit.record(manager, {
        projectId: project.id,
        entityType: 'project',
        entityId: project.id,
        action: 'project.updated',
        before,
        after: { name: project.name, description: project.description },
        summary: before.name === project.name ? `Edited the description of ${project.name}` : `Renamed the project ${before.name} to ${project.name}`,
      });
    });
    return this.get(access.projectId, access.role);
  }

  /** The ids of the projects the user is a member of. */
  async projectIdsOf(userId: string, manager?: EntityManager): Promise<string[]> {
    const rows = await (manager ? manager.getRepository(ProjectMemberEntity) : this.members).find({ select: { projectId: true }, where: { userId } });
    return rows.map((row) => row.projectId);
  }

  /** Each project's name by id (missing ids are left out). */
  async namesOf(ids: Iterable<string>, manager: EntityManager = this.unitOfWork.manager): Promise<Map<string, string>> {
    const wanted = [...new Set(ids)];
    if (wanted.length === 0) return new Map();
    const rows = await manager.getRepository(ProjectEntity).find({ select: { id: true, name: true }, where: { id: In(wanted) } });
    return new Map(rows.map((row) => [row.id, row.name]));
  }

  /** The id of the first project of this name, or null (for the demo seed). */
  async idByName(name: string, manager: EntityManager = this.unitOfWork.manager): Promise<string | null> {
    return (await manager.getRepository(ProjectEntity).findOneBy({ name }))?.id ?? null;
  }

  private async present(manager: EntityManager, projects: ProjectEntity[], roleOf: (project: ProjectEntity) => ProjectRole | null): Promise<Project[]> {
    const counts = await this.counts(manager, projects.map((p) => p.id));
    const creators = await this.users.cards(projects.map((p) => p.createdById), manager);
    return projects.map((project) => toProject(project, roleOf(project), counts.get(project.id)!, project.createdById === null ? undefined : creators.get(project.createdById)));
  }

  private async counts(manager: EntityManager, ids: string[]): Promise<Map<string, ProjectCounts>> {
    const counts = new Map(ids.map((id) => [id, { memberCount: 0, sheetCount: 0 }]));
    if (ids.length === 0) return counts;
    const rows: Array<{ projectId: string; count: number }> = await manager
      .getRepository(ProjectMemberEntity)
      .createQueryBuilder('row')
      .select('row.projectId', 'projectId')
      .addSelect('COUNT(*)', 'count')
      .where('row.projectId IN (:...ids)', { ids })
      .groupBy('row.projectId')
      .getRawMany();
    for (const row of rows) counts.get(row.projectId)!.memberCount = Number(row.count);
    for (const source of registeredUnder<ProjectSheetCounts>(this.moduleRef, PROJECT_SHEET_COUNTS)) {
      for (const [projectId, count] of await source.countByProject(ids)) counts.get(projectId)!.sheetCount += count;
    }
    return counts;
  }
}
