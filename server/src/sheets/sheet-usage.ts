import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, type Repository } from 'typeorm';
import { ProcessesService } from '../processes/processes.service.js';
import type { ProcessUseSource } from '../processes/process-visibility.js';
import type { ProjectSheetCounts } from '../projects/project-sheet-counts.js';
import { ProjectsService } from '../projects/projects.service.js';
import { SheetEntity } from './sheet.entity.js';

/**
 * What the sheets tell the modules below them: how many sheets each project holds (for projects), and which
 * process profiles a user's projects use (for the library: a member reads the profiles of the project's sheets).
 */
@Injectable()
export class SheetUsage implements ProjectSheetCounts, ProcessUseSource {
  constructor(
    @InjectRepository(SheetEntity) private readonly sheets: Repository<SheetEntity>,
    private readonly projects: ProjectsService,
    private readonly processes: ProcessesService,
  ) {}

  async countByProject(projectIds: readonly string[]): Promise<ReadonlyMap<string, number>> {
    if (projectIds.length === 0) return new Map();
    const rows: Array<{ projectId: string; count: number }> = await this.sheets
      .createQueryBuilder('sheet')
      .select('sheet.projectId', 'projectId')
      .addSelect('COUNT(*)', 'count')
      .where('sheet.projectId IN (:...projectIds)', { projectIds })
      .groupBy('sheet.projectId')
      .getRawMany();
    return new Map(rows.map((row) => [row.projectId, Number(row.count)]));
  }

  async profileIdsUsedBy(userId: string): Promise<string[]> {
    return this.profileIdsOfProjects(await this.projects.projectIdsOf(userId));
  }

  /** The process profiles the sheets of these projects are on. */
  async profileIdsOfProjects(projectIds: readonly string[]): Promise<string[]> {
    if (projectIds.length === 0) return [];
    const sheets = await this.sheets.find({ select: { id: true, processVersionId: true }, where: { projectId: In([...projectIds]) } });
    const facts = await this.processes.versionFacts(sheets.map((sheet) => sheet.processVersionId));
    return [...new Set([...facts.values()].map((fact) => fact.profileId))];
  }
}
