import { cornerShiftOf } from '@channelwright/shared/device';
import type { Process } from '@channelwright/shared/schemas';
import type { EntityManager } from 'typeorm';
import type { ProcessViewer } from '../processes/process-visibility.js';
import type { ProcessesService, ResolvedProcess } from '../processes/processes.service.js';

/**
 * The process version a sheet create or edit asks for: `processId` (its `processVersion`, else the
 * latest), or `processVersion` of the sheet's current profile; undefined when neither is given. A profile
 * the editor may not read is as unknown as a missing one (404 PROCESS_NOT_FOUND), so a sheet cannot be
 * used to reach a profile of the library.
 */
export async function chosenProcess(
  processes: ProcessesService,
  manager: EntityManager,
  request: { processId?: string; processVersion?: number },
  viewer: ProcessViewer,
  currentProfileId?: string,
): Promise<ResolvedProcess | undefined> {
  if (request.processId !== undefined) return processes.resolveDefinition(request.processId, request.processVersion, manager, viewer);
  if (request.processVersion !== undefined && currentProfileId !== undefined) return processes.resolveDefinition(currentProfileId, request.processVersion, manager);
  return undefined;
}

/** 400 UNKNOWN_CORNER (field corner) when the sheet's default corner is not one of the process's. */
export function assertSheetCorner(process: Process, corner: string): void {
  cornerShiftOf(process, 'nmos', corner, 'corner');
}
