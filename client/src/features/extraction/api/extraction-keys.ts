/** Every query key of parameter extractions, from one place; only this feature reads them. */
export const extractionKeys = {
  all: ['extractions'] as const,
  detail: (id: string) => [...extractionKeys.all, 'detail', id] as const,
  curves: (id: string) => [...extractionKeys.all, 'curves', id] as const,
};
