// Owned by the engine work: zod schema of a process (parameters per polarity, corners).
export {};
