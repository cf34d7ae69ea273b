import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { conflict } from '../common/errors/domain-error.js';
import type { SheetRemovalCheck } from '../sheets/sheet-removal-check.js';
import { RevisionEntity } from './revision.entity.js';

/** A sheet with revisions keeps them, and so is never deleted: 409 SHEET_HAS_REVISIONS (nothing written). */
@Injectable()
export class RevisionsKeepSheets implements SheetRemovalCheck {
  async assertRemovable(manager: EntityManager, sheetId: string): Promise<void> {
    const count = await manager.getRepository(RevisionEntity).countBy({ sheetId });
    if (count > 0) throw conflict('SHEET_HAS_REVISIONS', `This sheet has ${count} frozen revision${count === 1 ? '' : 's'}, which are kept for the record, so the sheet cannot be deleted`);
  }
}
