import type { ModelCardMapping, ModelCardProblem } from '../schemas/model-card.js';
import type { ModelCard, ModelPolarity, ModelStatement } from './model-card.js';

/** What a mapping is checked against: the corner names of the process version and its flavours. */
export interface MappingTarget {
  corners: readonly string[];
  flavours: readonly { name: string; polarity: ModelPolarity }[];
}

/** Section names a corner is often given, beside its own name (common practice, no source). */
const CORNER_ALIASES: Record<string, readonly string[]> = {
  tt: ['tt', 'typ', 'typical', 'nom', 'nominal', 'tm', 'mos_tt'],
  ff: ['ff', 'fast', 'mos_ff'],
  ss: ['ss', 'slow', 'mos_ss'],
  fs: ['fs', 'fnsp', 'mos_fs'],
  sf: ['sf', 'snfp', 'mos_sf'],
};

/** Every model of the card by name, with the first statement seen (a name keeps its polarity across sections). */
function modelsOf(card: ModelCard): Map<string, ModelStatement> {
  const models = new Map<string, ModelStatement>();
  for (const section of card.sections) for (const model of section.models) if (!models.has(model.name)) models.set(model.name, model);
  return models;
}

/**
 * A first mapping from the names: each corner to the section named like it (TT → tt, typ, nominal …; a card without
 * sections gives its statements to TT), each flavour to a model of its polarity whose name holds the flavour's name or
 * ends in its first two letters (native → bfn18na), and NMOS and PMOS each to the shortest remaining model name of
 * that polarity. The maintainer checks it before it is stored.
 */
export function guessCardMapping(card: ModelCard, target: MappingTarget): ModelCardMapping {
  const named = card.sections.filter((section) => section.name !== null).map((section) => section.name as string);
  const corners: ModelCardMapping['corners'] = {};
  if (named.length === 0) {
    if (target.corners.includes('TT')) corners.TT = null;
  } else {
    for (const corner of target.corners) {
      const key = corner.toLowerCase();
      const found = named.find((name) => name === key) ?? named.find((name) => (CORNER_ALIASES[key] ?? []).includes(name));
      if (found !== undefined) corners[corner] = found;
    }
  }
  const left = [...modelsOf(card).values()];
  const take = (model: ModelStatement | undefined) => {
    if (model) left.splice(left.indexOf(model), 1);
    return model;
  };
  const devices: ModelCardMapping['devices'] = [];
  for (const flavour of target.flavours) {
    const key = flavour.name.toLowerCase();
    const model = take(left.find((m) => m.polarity === flavour.polarity && (m.name.includes(key) || m.name.endsWith(key.slice(0, 2)))));
    if (model) devices.push({ model: model.name, polarity: flavour.polarity, flavour: flavour.name });
  }
  for (const polarity of ['nmos', 'pmos'] as const) {
    const model = take(left.filter((m) => m.polarity === polarity).sort((a, b) => a.name.length - b.name.length)[0]);
    if (model) devices.push({ model: model.name, polarity });
  }
  return { corners, devices };
}

/**
 * What is wrong with a mapping, each problem with the mapping entry it concerns: a corner the process lacks, a section
 * or model the card lacks, a model of the other polarity, a flavour the process lacks, a device mapped twice, a mapped
 * model missing from a mapped corner's section. Empty when the mapping can be stored.
 */
export function cardMappingProblems(card: ModelCard, mapping: ModelCardMapping, target: MappingTarget): ModelCardProblem[] {
  const problems: ModelCardProblem[] = [];
  const add = (field: string, message: string) => problems.push({ field: `mapping.${field}`, message });
  const models = modelsOf(card);
  const sectionOf = (name: string | null) => card.sections.find((section) => section.name === name);
  for (const [corner, section] of Object.entries(mapping.corners)) {
    if (!target.corners.includes(corner)) add(`corners.${corner}`, `${corner} is not a corner of this process (corners: ${target.corners.join(', ')})`);
    if (!sectionOf(section)) add(`corners.${corner}`, section === null ? 'The card has no statements outside a .lib section' : `The card has no section ${section}`);
  }
  const seen = new Set<string>();
  mapping.devices.forEach((device, index) => {
    const model = models.get(device.model);
    const label = device.flavour === undefined ? device.polarity.toUpperCase() : `${device.polarity.toUpperCase()} ${device.flavour}`;
    if (!model) add(`devices.${index}.model`, `The card has no model ${device.model}`);
    else if (model.polarity !== device.polarity) add(`devices.${index}.polarity`, `Model ${device.model} is ${model.polarity}, not ${device.polarity}`);
    if (device.flavour !== undefined) {
      const flavour = target.flavours.find((f) => f.name === device.flavour);
      if (!flavour) add(`devices.${index}.flavour`, `${device.flavour} is not a flavour of this process (flavours: ${target.flavours.map((f) => f.name).join(', ') || 'none'})`);
      else if (flavour.polarity !== device.polarity) add(`devices.${index}.flavour`, `Flavour ${device.flavour} is ${flavour.polarity}, not ${device.polarity}`);
    }
    const key = `${device.polarity}/${device.flavour ?? ''}`;
    if (seen.has(key)) add(`devices.${index}`, `${label} is mapped twice`);
    seen.add(key);
    if (!model) return;
    for (const [corner, section] of Object.entries(mapping.corners)) {
      const holds = (name: string | null) => sectionOf(name)?.models.some((m) => m.name === device.model) ?? false;
      if (sectionOf(section) && !holds(section) && !holds(null)) add(`corners.${corner}`, `Section ${section ?? '(outside any section)'} of corner ${corner} has no model ${device.model} (mapped to ${label})`);
    }
  });
  return problems;
}
