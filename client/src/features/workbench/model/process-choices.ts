import { cornerNames, type Process } from '@channelwright/shared/schemas';
import type { ProcessChoices } from '../components/targets-form';
import type { ProcessSpan } from '../charts/chart-requests';

/** What the form and the charts need of a process definition. */
export function processChoicesOf(process: Process): ProcessChoices & ProcessSpan {
  const flavoursOf = (polarity: 'nmos' | 'pmos') => (process.flavours ?? []).filter((f) => f.polarity === polarity).map((f) => f.name);
  return {
    corners: cornerNames(process),
    flavours: { nmos: flavoursOf('nmos'), pmos: flavoursOf('pmos') },
    tnom: process.tnom,
    vdd: process.vdd,
    tempRange: process.tempRange,
  };
}
