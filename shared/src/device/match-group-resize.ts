import { matchGroupMismatch, type MismatchDevice } from './mismatch.js';
import { offsetArea } from './offset-area.js';

/** A member of a match group as it is now. */
export interface ResizeMember {
  w: number;
  l: number;
  multiplier: number;
  gmId: number;
  vov: number;
  fingers: number;
  /** Pelgrom coefficients of its device type, V·m and m. */
  avt: number;
  abeta: number;
  /** The process minimum length, and the grid a drawn length snaps to, m. */
  lmin: number;
  grid: number;
}

export interface MemberSize {
  w: number;
  l: number;
  gmId: number;
  vov: number;
  fingers: number;
}

/**
 * Sizes member `index` again at length l with its own ID and the same gm/ID (or VOV): the caller's engine
 * call (computeSize for whatever model the device uses). A sentence when it cannot.
 */
export type MemberSizer = (index: number, l: number) => MemberSize | string;

export interface OffsetFigures {
  sigmaVos: number;
  sigmaVt: number;
  sigmaBeta: number;
  area: number;
}

export interface GroupResizePlan {
  scale: number;
  requiredArea: number;
  before: OffsetFigures;
  after: OffsetFigures;
  sizes: MemberSize[];
  meetsTarget: boolean;
  limitedBy: string | null;
}

const MAX_STEPS = 24;
/** Aim this little below the target, so that the width grid does not leave the group just above it. */
const AIM = 0.998;

function figures(members: readonly { w: number; l: number; gmId: number; multiplier: number; avt: number; abeta: number }[]): OffsetFigures {
  const devices: MismatchDevice[] = members.map((m) => ({ avt: m.avt, abeta: m.abeta, w: m.w * m.multiplier, l: m.l, gmId: m.gmId }));
  const worst = matchGroupMismatch(devices);
  return {
    sigmaVos: worst?.sigmaVos ?? 0,
    sigmaVt: worst?.sigmaVt ?? 0,
    sigmaBeta: worst?.sigmaBeta ?? 0,
    area: members.reduce((sum, m) => sum + m.w * m.l * m.multiplier, 0),
  };
}

/**
 * Re-sizes a match group to meet a target input-referred σ(VOS) of its worst pair (Pelgrom 1989, Kinget 2005):
 * every member's L is scaled by the same factor s (snapped to the grid, at least lmin) and the member sized
 * again at the same gm/ID or VOV by `size`, which keeps its W/L nearly constant, so its area scales by about
 * s² and σ(VOS) by 1/s; ratios between members (a 4:1 mirror) stay. s is found by a fixed-point iteration on
 * the σ the engine's own sizes give, until σ(VOS) is at most the target and within 1 % of it (or the lengths
 * reach lmin, or a size is refused: `limitedBy` says which). A group of fewer than two members has no offset.
 */
export function resizeMatchGroup(members: readonly ResizeMember[], target: number, size: MemberSizer): GroupResizePlan {
  const before = figures(members);
  const worst = matchGroupMismatch(members.map((m) => ({ avt: m.avt, abeta: m.abeta, w: m.w * m.multiplier, l: m.l, gmId: m.gmId })));
  const pair = worst ? [members[worst.a], members[worst.b]] : members.slice(0, 1);
  const meanGmId = pair.reduce((sum, m) => sum + m.gmId, 0) / Math.max(1, pair.length);
  const requiredArea = pair.length > 0 ? offsetArea(pair[0].avt, pair[0].abeta, meanGmId, target) : 0;
  const current: MemberSize[] = members.map(({ w, l, gmId, vov, fingers }) => ({ w, l, gmId, vov, fingers }));
  if (members.length < 2) return { scale: 1, requiredArea, before, after: before, sizes: current, meetsTarget: before.sigmaVos <= target, limitedBy: 'A match group needs two devices to have an offset' };

  let scale = before.sigmaVos > 0 ? (before.sigmaVos / target) / AIM : 1;
  let best: { scale: number; sizes: MemberSize[]; after: OffsetFigures } | null = null;
  let limitedBy: string | null = null;
  for (let step = 0; step < MAX_STEPS; step++) {
    const lengths = members.map((m) => Math.max(m.lmin, Math.round((m.l * scale) / m.grid) * m.grid));
    const sized = lengths.map((l, index) => size(index, Number(l.toPrecision(12))));
    const refused = sized.find((s): s is string => typeof s === 'string');
    if (refused !== undefined) {
      limitedBy = refused;
      break;
    }
    const sizes = sized as MemberSize[];
    const after = figures(members.map((m, i) => ({ ...m, ...sizes[i] })));
    const meets = after.sigmaVos <= target;
    if (meets && (!best || after.area < best.after.area)) best = { scale, sizes, after };
    if (meets && after.sigmaVos >= target * 0.99) break;
    const atLmin = lengths.every((l, i) => l <= members[i].lmin);
    if (meets && atLmin) {
      limitedBy = 'Every length is at lmin: the group cannot shrink further at this gm/ID';
      break;
    }
    scale *= (after.sigmaVos / target) / AIM;
  }
  const chosen = best ?? { scale, sizes: current, after: before };
  const meetsTarget = chosen.after.sigmaVos <= target;
  if (!meetsTarget && limitedBy === null) limitedBy = 'No length found that meets the target within the iteration limit';
  return { scale: chosen.scale, requiredArea, before, after: chosen.after, sizes: chosen.sizes, meetsTarget, limitedBy };
}
