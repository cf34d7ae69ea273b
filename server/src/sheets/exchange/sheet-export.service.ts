import { ENGINE_VERSION } from '@channelwright/shared/device';
import { writeSheetCsv, writeSheetMetadataCsv, writeSpiceDeck } from '@channelwright/shared/formats';
import type { ExportQuery } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { registeredUnder } from '../../common/extension-points.js';
import { ProjectsService } from '../../projects/projects.service.js';
import { exportFileName } from './export-file-name.js';
import { SheetReader } from '../sheet-reader.js';
import { toSheet } from '../sheet-response.js';
import { SHEET_REVISION_FACTS, type SheetRevisionFacts } from '../sheet-revision-facts.js';

export interface ExportedFile {
  fileName: string;
  contentType: string;
  body: string;
}

/** The sheet as a file: its CSV (with or without # metadata), the metadata alone, or SPICE instance lines. Callers check access. */
@Injectable()
export class SheetExportService {
  constructor(
    private readonly reader: SheetReader,
    private readonly projects: ProjectsService,
    private readonly moduleRef: ModuleRef,
  ) {}

  async export(sheetId: string, query: ExportQuery): Promise<ExportedFile> {
    const loaded = await this.reader.load(sheetId);
    const sheet = toSheet(loaded);
    const projectName = (await this.projects.namesOf([sheet.projectId])).get(sheet.projectId) ?? '';
    const context = { projectName, exportedAt: new Date(), engineVersion: ENGINE_VERSION, lengths: query.lengths };
    if (query.format === 'spice') {
      const [facts] = registeredUnder<SheetRevisionFacts>(this.moduleRef, SHEET_REVISION_FACTS);
      const revision = facts ? await facts.newestOf(loaded) : null;
      const body = writeSpiceDeck(sheet, loaded.process.definition, { ...context, revision, fingers: query.fingers });
      return { fileName: exportFileName(projectName, sheet.name, '.sp'), contentType: 'text/plain; charset=utf-8', body };
    }
    if (query.format === 'csv-metadata') {
      return { fileName: exportFileName(projectName, sheet.name, '.metadata.csv'), contentType: 'text/csv; charset=utf-8', body: writeSheetMetadataCsv(sheet, context) };
    }
    const body = writeSheetCsv(sheet, context, { metadata: query.metadata, lengths: query.lengths });
    return { fileName: exportFileName(projectName, sheet.name, '.csv'), contentType: 'text/csv; charset=utf-8', body };
  }
}
