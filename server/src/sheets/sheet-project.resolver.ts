import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { DomainError } from '../common/errors/domain-error.js';
import type { ProjectResourceResolver } from '../projects/project-resource-resolver.js';
import { sheetNotFound } from './sheet-reader.js';
import { SheetEntity } from './sheet.entity.js';

/** Lets `@ProjectAccess(need, 'sheet')` find the project of /api/sheets/:id. */
@Injectable()
export class SheetProjectResolver implements ProjectResourceResolver {
  readonly kind = 'sheet';

  constructor(@InjectRepository(SheetEntity) private readonly sheets: Repository<SheetEntity>) {}

  async projectIdOf(sheetId: string): Promise<string | null> {
    const sheet = await this.sheets.findOne({ select: { id: true, projectId: true }, where: { id: sheetId } });
    return sheet?.projectId ?? null;
  }

  notFound(): DomainError {
    return sheetNotFound();
  }
}
