import { execFile } from 'node:child_process';

export interface NativeNgspice {
  command: string;
  /** e.g. "39" for Debian's ngspice-39. */
  version: string;
}

/** Debian's ngspice when it is installed and runs (`ngspice -v`, no shell); null otherwise. */
export function findNativeNgspice(command = 'ngspice'): Promise<NativeNgspice | null> {
  return new Promise((resolve) => {
    execFile(command, ['-v'], { timeout: 10_000, env: { PATH: process.env.PATH ?? '/usr/bin:/bin', LANG: 'C' } }, (_error, stdout, stderr) => {
      const version = /ngspice-(\S+)/.exec(`${stdout}${stderr}`);
      resolve(version ? { command, version: version[1] } : null);
    });
  });
}
