import { cornerNames, type Process } from '@channelwright/shared/schemas';
import type { ProcessChoices } from '../components/targets-form';

/** What the targets form needs of a process definition. */
export function processChoicesOf(process: Process): ProcessChoices {
  const flavoursOf = (polarity: 'nmos' | 'pmos') => (process.flavours ?? []).filter((f) => f.polarity === polarity).map((f) => f.name);
  return {
    corners: cornerNames(process),
    flavours: { nmos: flavoursOf('nmos'), pmos: flavoursOf('pmos') },
    tnom: process.tnom,
    vdd: process.vdd,
  };
}
