import { parameterInfo, type ParameterChange, type Process } from '@channelwright/shared/schemas';
import type { StoredCard } from './model-card/stored-card.js';

type Leaf = number | string | boolean;
type Group = ParameterChange['group'];

/**
 * What changed from one process definition to another, one entry per value, by dotted path:
 * "vdd", "tempRange.max", "nmos.kp", "corners.FF.pmos.dvt", "flavours.native.params.vt0".
 * Corners and flavours are matched by name, so reordering them is no change. Entries follow the
 * newer definition's order; removed values come last.
 */
export function diffProcesses(from: Process, to: Process): ParameterChange[] {
  return diffLeaves(flatten(from), flatten(to));
}

/** What changed from one version to another: the definitions, and the model cards (hash and mapping, under "modelCard."). */
export function diffVersions(from: { definition: Process; card: StoredCard | null }, to: { definition: Process; card: StoredCard | null }): ParameterChange[] {
  return [...diffProcesses(from.definition, to.definition), ...diffLeaves(flatten(cardFacts(from.card)), flatten(cardFacts(to.card)))];
}

/** A card as the diff compares it: its hash, each corner's section, each model's device ("nmos", "nmos native"). */
function cardFacts(card: StoredCard | null): { modelCard?: Record<string, unknown> } {
  if (card === null) return {};
  const corners = Object.fromEntries(Object.entries(card.mapping.corners).map(([corner, section]) => [corner, section ?? '(outside any section)']));
  const devices = Object.fromEntries(card.mapping.devices.map((d) => [d.model, d.flavour === undefined ? d.polarity : `${d.polarity} ${d.flavour}`]));
  return { modelCard: { sha256: card.sha256, corners, devices } };
}

function diffLeaves(before: Map<string, Leaf>, after: Map<string, Leaf>): ParameterChange[] {
  const changes: ParameterChange[] = [];
  for (const [path, value] of after) {
    const old = before.get(path);
    if (old === undefined) changes.push(change(path, 'added', null, value));
    else if (old !== value) changes.push(change(path, 'changed', old, value));
  }
  for (const [path, value] of before) if (!after.has(path)) changes.push(change(path, 'removed', value, null));
  return changes;
}

function change(path: string, kind: ParameterChange['kind'], from: Leaf | null, to: Leaf | null): ParameterChange {
  return { path, group: groupOf(path), kind, unit: unitOf(path), from, to };
}

function groupOf(path: string): Group {
  const head = path.split('.')[0];
  return head === 'nmos' || head === 'pmos' || head === 'corners' || head === 'flavours' || head === 'modelCard' ? head : 'process';
}

/** SI unit of the value at a path, from the parameter table; '' for text and plain numbers. */
function unitOf(path: string): string {
  if (path.startsWith('modelCard.')) return '';
  const info = path.startsWith('tempRange.') ? parameterInfo(path) : parameterInfo(path.split('.').at(-1)!);
  return info?.unit ?? '';
}

/** Leaves by dotted path; arrays of named items are keyed by name (the name itself is the key, not a leaf). */
function flatten(value: unknown, prefix = '', into = new Map<string, Leaf>()): Map<string, Leaf> {
  if (Array.isArray(value)) {
    value.forEach((item: { name?: string }, index) => {
      const key = typeof item?.name === 'string' ? item.name : String(index);
      const { name: _name, ...rest } = item;
      flatten(rest, `${prefix}${key}.`, into);
    });
  } else if (value !== null && typeof value === 'object') {
    for (const [key, child] of Object.entries(value)) flatten(child, `${prefix}${key}.`, into);
  } else if (value !== undefined) {
    into.set(prefix.slice(0, -1), value as Leaf);
  }
  return into;
}
