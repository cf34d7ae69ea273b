// jest on an ESM NestJS server: @swc/jest compiles everything (node_modules' ESM too) to CommonJS,
// with legacy decorators and their metadata; `.js` suffixes of relative imports are stripped.
const swcOptions = {
  jsc: {
    parser: { syntax: 'typescript', decorators: true },
    transform: { legacyDecorator: true, decoratorMetadata: true },
    target: 'es2022',
  },
  module: { type: 'commonjs' },
  sourceMaps: 'inline',
};

export default {
  testEnvironment: 'node',
  rootDir: '.',
  roots: ['<rootDir>/src', '<rootDir>/test'],
  testRegex: '.*\\.(spec|e2e-spec)\\.ts$',
  moduleFileExtensions: ['ts', 'js', 'mjs', 'cjs', 'json'],
  transform: { '^.+\\.(t|j|mj|cj)s$': ['@swc/jest', swcOptions] },
  transformIgnorePatterns: [],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  // bcrypt at cost 12 takes about a quarter of a second per hash on this class of machine.
  testTimeout: 30000,
};
