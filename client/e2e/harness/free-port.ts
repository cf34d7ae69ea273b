import { createServer } from 'node:net';

/** A TCP port that was free a moment ago on 127.0.0.1 (the OS picks it). */
export function findFreePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.unref();
    probe.on('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      if (address === null || typeof address === 'string') {
        probe.close();
        reject(new Error('Could not read the port of the probe server'));
        return;
      }
      probe.close(() => resolve(address.port));
    });
  });
}
