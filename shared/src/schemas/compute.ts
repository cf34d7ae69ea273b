// Owned by the engine work: zod schemas of the compute API (size, sweep, corners).
export {};
