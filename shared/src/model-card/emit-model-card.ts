import type { ModelCard, ModelStatement } from './model-card.js';

/** Parameters per `+` line of the emitted text. */
const PER_LINE = 6;

/** A number as SPICE reads it back exactly: the shortest text that round-trips, exponent form when very large or small. */
export function spiceNumber(value: number): string {
  const magnitude = Math.abs(value);
  const text = magnitude !== 0 && (magnitude >= 1e6 || magnitude < 1e-4) ? value.toExponential() : String(value);
  return text.replace('e+', 'e');
}

/** One `.model` statement in Channelwright's own layout; `name` renames it (e.g. to a name the netlist chooses). */
export function emitModel(model: ModelStatement, name: string = model.name): string {
  const head = [`.model ${name} ${model.polarity} level=${model.level}`, ...(model.version === undefined ? [] : [`version=${model.version}`])].join(' ');
  const words = Object.entries(model.parameters).map(([key, value]) => `${key}=${spiceNumber(value)}`);
  const lines = [head];
  for (let index = 0; index < words.length; index += PER_LINE) lines.push(`+ ${words.slice(index, index + PER_LINE).join(' ')}`);
  return lines.join('\n');
}

/**
 * The parsed card as clean SPICE text, written by us from the parsed statements (never the uploaded text):
 * one model per statement, each named section between `.lib <name>` and `.endl <name>`.
 */
export function emitModelCard(card: ModelCard): string {
  const out = ['* Model card re-emitted by Channelwright from the parsed statements'];
  for (const section of card.sections) {
    const models = section.models.map((model) => emitModel(model));
    if (section.name === null) out.push(...models);
    else out.push(`.lib ${section.name}`, ...models, `.endl ${section.name}`);
  }
  return `${out.join('\n')}\n`;
}
