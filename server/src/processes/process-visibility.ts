import { Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { registeredUnder } from '../common/extension-points.js';
import type { Account } from '../users/users.service.js';
import { isProcessMaintainer } from './process-maintainer.guard.js';

/** Who is asking to read the library. */
export type ProcessViewer = Pick<Account, 'id' | 'role' | 'processMaintainer' | 'libraryAccess'>;

/**
 * A feature that puts processes to use tells which profiles a user meets there (sheets: the profiles of the
 * sheets in the user's projects). Registered with `{ provide: PROCESS_USE_SOURCES, useClass: … }` in that
 * feature's module; the library itself knows no project or sheet.
 */
export interface ProcessUseSource {
  profileIdsUsedBy(userId: string): Promise<Iterable<string>>;
}

export const PROCESS_USE_SOURCES = Symbol('PROCESS_USE_SOURCES');

/**
 * Which profiles a user may read (list, open, export, diff, compute with). Admins, process maintainers and
 * accounts an admin granted library access read all of them; everyone else only the profiles their projects use.
 */
@Injectable()
export class ProcessVisibility {
  constructor(private readonly moduleRef: ModuleRef) {}

  async visibleTo(viewer: ProcessViewer): Promise<'all' | ReadonlySet<string>> {
    if (isProcessMaintainer(viewer) || viewer.libraryAccess) return 'all';
    const visible = new Set<string>();
    for (const source of this.sources()) for (const id of await source.profileIdsUsedBy(viewer.id)) visible.add(id);
    return visible;
  }

  async sees(viewer: ProcessViewer, profileId: string): Promise<boolean> {
    const visible = await this.visibleTo(viewer);
    return visible === 'all' || visible.has(profileId);
  }

  private sources(): ProcessUseSource[] {
    return registeredUnder<ProcessUseSource>(this.moduleRef, PROCESS_USE_SOURCES);
  }
}
