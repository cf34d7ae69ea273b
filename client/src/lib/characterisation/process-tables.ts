import { characterisationTableListSchema, type CharacterisationTable } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import { characterisationKeys } from './characterisation-keys';

/**
 * `GET /api/processes/:id/tables?version=`: the lookup tables characterised for one version. Here in lib because the
 * characterisation panel lists them, the device editor offers the table model only when they exist, and the design
 * charts pick a device from them.
 */
export const getProcessTables = (processId: string, version: number, signal?: AbortSignal): Promise<CharacterisationTable[]> =>
  apiRequest(`/processes/${encodeURIComponent(processId)}/tables?version=${version}`, { schema: characterisationTableListSchema, signal });

export const processTablesQueryOptions = (processId: string, version: number) =>
  queryOptions({ queryKey: characterisationKeys.tables(processId, version), queryFn: ({ signal }) => getProcessTables(processId, version, signal) });

/** No process chosen yet reads nothing. */
export const useProcessTables = (processId: string | undefined, version: number | undefined) =>
  useQuery({ ...processTablesQueryOptions(processId ?? '', version ?? 0), enabled: Boolean(processId) && version !== undefined && version > 0 });

type Device = { polarity: string; flavour?: string | null };

/** NMOS, then PMOS, then the flavours by name: the order devices are listed and offered in (the standard device first). */
export const byDevice = (a: Device, b: Device): number =>
  Number(Boolean(a.flavour)) - Number(Boolean(b.flavour)) || a.polarity.localeCompare(b.polarity) || (a.flavour ?? '').localeCompare(b.flavour ?? '');

/** The tables the table model uses, one per device (polarity and flavour), in device order. */
export const currentTables = (tables: CharacterisationTable[] | undefined): CharacterisationTable[] => (tables ?? []).filter((table) => table.current).sort(byDevice);
