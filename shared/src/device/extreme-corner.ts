import { cornerNames, type Process } from '../schemas/process.js';

/**
 * The slowest corner raises the threshold of both polarities most (then lowers kp most); the fastest the
 * opposite, and it is where off currents are highest. TT counts as a corner with no shift.
 */
export function extremeCorner(process: Pick<Process, 'corners'>, which: 'slowest' | 'fastest'): string {
  const sign = which === 'slowest' ? 1 : -1;
  const score = (name: string) => {
    const corner = process.corners.find((c) => c.name === name);
    const dvt = corner ? corner.nmos.dvt + corner.pmos.dvt : 0;
    const kp = corner ? corner.nmos.kpScale + corner.pmos.kpScale : 2;
    return { dvt: sign * dvt, kp: -sign * kp };
  };
  return cornerNames(process).reduce((best, name) => {
    const [a, b] = [score(name), score(best)];
    return a.dvt > b.dvt || (a.dvt === b.dvt && a.kp > b.kp) ? name : best;
  });
}
