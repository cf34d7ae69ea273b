import { cornerShiftOf } from '@channelwright/shared/device';
import type { Process } from '@channelwright/shared/schemas';
import type { EntityManager } from 'typeorm';
import type { ProcessesService, ResolvedProcess } from '../processes/processes.service.js';

/**
 * The process version a sheet create or edit asks for: `processId` (its `processVersion`, else the
 * latest), or `processVersion` of the sheet's current profile; undefined when neither is given.
 */
export async function chosenProcess(
  processes: ProcessesService,
  manager: EntityManager,
  request: { processId?: string; processVersion?: number },
  currentProfileId?: string,
): Promise<ResolvedProcess | undefined> {
  const profileId = request.processId ?? (request.processVersion !== undefined ? currentProfileId : undefined);
  if (profileId === undefined) return undefined;
  return processes.resolveDefinition(profileId, request.processVersion, manager);
}

/** 400 UNKNOWN_CORNER (field corner) when the sheet's default corner is not one of the process's. */
export function assertSheetCorner(process: Process, corner: string): void {
  cornerShiftOf(process, 'nmos', corner, 'corner');
}
