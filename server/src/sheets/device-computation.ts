import { computeSize, ENGINE_VERSION, isEngineError, type TableSource } from '@channelwright/shared/device';
import { isErrorCode, type DeviceComputeError, type DeviceResult, type DeviceTargets, type ErrorCode } from '@channelwright/shared/schemas';
import { DomainError } from '../common/errors/domain-error.js';
import type { ResolvedProcess } from '../processes/processes.service.js';
import { sizeRequestOf } from './device-targets.js';
import type { DeviceEntity } from './device.entity.js';
import type { SheetEntity } from './sheet.entity.js';

/** What a computation stores on a device row: the result or the engine's refusal, and what made it. */
export interface DeviceComputation {
  result: DeviceResult | null;
  error: DeviceComputeError | null;
  engineVersion: string;
  processVersionId: string;
  computedAt: Date;
}

/**
 * Refusals that mean the targets name something the sheet's process does not have: on create and
 * edit they answer 400 (nothing stored). Every other EngineError is a target the engine cannot meet,
 * stored with the device so the designer sees why.
 */
const BAD_REFERENCE_CODES = new Set<ErrorCode>(['VALIDATION_FAILED', 'UNKNOWN_CORNER', 'UNKNOWN_FLAVOUR', 'FLAVOUR_POLARITY_MISMATCH']);

/** Sizes a device with the engine on the sheet's process version (defaults from the sheet); `tables` for the table model. */
export function computeDevice(targets: DeviceTargets, sheet: Pick<SheetEntity, 'temperature' | 'corner' | 'model'>, process: ResolvedProcess, tables?: TableSource): DeviceComputation {
  const made = { engineVersion: ENGINE_VERSION, processVersionId: process.versionId, computedAt: new Date() };
  try {
    const response = computeSize(sizeRequestOf(targets, sheet, process), process.definition, tables);
    return { ...made, result: { ...response, processVersionId: process.versionId, processVersion: process.version }, error: null };
  } catch (error) {
    if (!isEngineError(error)) throw error;
    return { ...made, result: null, error: { code: error.code, message: error.message, ...(error.field === undefined ? {} : { field: error.field }) } };
  }
}

/** True when the targets refer to a corner or flavour the process lacks (a refusal, not a result to store). */
export function isBadReference(computation: DeviceComputation): boolean {
  const { error } = computation;
  return error !== null && isErrorCode(error.code) && BAD_REFERENCE_CODES.has(error.code);
}

/** On create and edit: 400 naming the field when the targets refer to a corner or flavour the process lacks. */
export function assertKnownToProcess(computation: DeviceComputation): void {
  const { error } = computation;
  if (error && isBadReference(computation)) throw new DomainError(error.code as ErrorCode, error.message, 400, error.field);
}

/** The columns of a device row that hold a computation. */
export function computationColumns(computation: DeviceComputation): Pick<DeviceEntity, 'result' | 'error' | 'engineVersion' | 'processVersionId' | 'computedAt'> {
  return {
    result: computation.result === null ? null : JSON.stringify(computation.result),
    error: computation.error === null ? null : JSON.stringify(computation.error),
    engineVersion: computation.engineVersion,
    processVersionId: computation.processVersionId,
    computedAt: computation.computedAt,
  };
}
