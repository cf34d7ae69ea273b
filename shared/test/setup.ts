import fc from 'fast-check';

// FC_RUNS=5000 npx vitest run searches the property tests harder than the default 100 runs each.
if (process.env.FC_RUNS) fc.configureGlobal({ numRuns: Number(process.env.FC_RUNS) });
