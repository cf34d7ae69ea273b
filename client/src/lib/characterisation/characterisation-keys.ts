/**
 * Every query key of characterisations and their tables, from one place: the characterisation feature starts and
 * cancels jobs, and the device editor and the design charts read a version's tables, so the keys live in lib.
 */
export const characterisationKeys = {
  all: ['characterisations'] as const,
  ofVersion: (processId: string, version: number) => [...characterisationKeys.all, 'version', processId, version] as const,
  jobs: (processId: string, version: number) => [...characterisationKeys.ofVersion(processId, version), 'jobs'] as const,
  tables: (processId: string, version: number) => [...characterisationKeys.ofVersion(processId, version), 'tables'] as const,
  job: (id: string) => [...characterisationKeys.all, 'job', id] as const,
  designChart: (processId: string, query: Record<string, unknown>) => [...characterisationKeys.all, 'design-chart', processId, query] as const,
};
