import { spawnSync } from 'node:child_process';

/**
 * Whether Debian's native ngspice runs here. Suites that compare against it skip locally without it and
 * fail under CI=true (CI installs the package; a suite must not pass by not running).
 */
export const NATIVE_NGSPICE = /ngspice-\d/.test(`${spawnSync('ngspice', ['-v'], { encoding: 'utf8' }).stdout ?? ''}`);
export const ON_CI = process.env.CI === 'true';

/** describe for suites that need native ngspice: skipped locally without it, run (and failing in beforeAll) under CI. */
export const describeWithNgspice: jest.Describe = NATIVE_NGSPICE || ON_CI ? describe : describe.skip;

/** Call in beforeAll of such a suite: under CI without ngspice every test of the suite fails with this reason. */
export function requireNativeNgspice(): void {
  if (!NATIVE_NGSPICE) throw new Error('Debian ngspice is not installed (apt-get install -y ngspice); CI must install it');
}

if (!NATIVE_NGSPICE && !ON_CI) console.warn('ngspice is not installed: the comparisons against native ngspice are skipped (they fail instead when CI=true)');
