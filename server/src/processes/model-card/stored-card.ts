import { createHash } from 'node:crypto';
import { cardMappingProblems, cardSections, checkModelCard, emitModelCard, guessCardMapping, type MappingTarget, type ModelCard, parseModelCard } from '@channelwright/shared/model-card';
import { cornerNames, type ModelCardCheck, type ModelCardMapping, type ModelCardSummary, type Problem, type Process } from '@channelwright/shared/schemas';
import { DomainError } from '../../common/errors/domain-error.js';

/** A model card as a version stores it: the text Channelwright re-emitted from the parsed statements, its hash, its mapping. */
export interface StoredCard {
  text: string;
  sha256: string;
  mapping: ModelCardMapping;
}

/** What a mapping is checked against: the version's corner names and flavours. */
export function mappingTarget(definition: Process): MappingTarget {
  return { corners: cornerNames(definition), flavours: (definition.flavours ?? []).map((f) => ({ name: f.name, polarity: f.polarity })) };
}

/**
 * An uploaded card made ready to store: parsed (never trusted; 400 MODEL_CARD_REFUSED, or MODEL_CARD_INVALID, listing
 * every problem with its line), its mapping checked against the version's corners and flavours (guessed from the names
 * when not given; 400 MODEL_CARD_MAPPING_INVALID listing every wrong entry), and re-emitted.
 */
export function readModelCard(text: string, mapping: ModelCardMapping | undefined, definition: Process): StoredCard {
  const check = checkModelCard(text);
  if (!check.card) {
    const problems: Problem[] = check.problems.map((p) => ({ row: p.line, field: 'card', message: `Line ${p.line}: ${p.reason}` }));
    const code = check.problems.some((p) => p.code === 'MODEL_CARD_REFUSED') ? 'MODEL_CARD_REFUSED' : 'MODEL_CARD_INVALID';
    throw new DomainError(code, `The model card has ${count(problems.length)}, the first on line ${check.problems[0].line}: ${check.problems[0].reason}; nothing was stored`, 400, 'card', problems);
  }
  if (check.card.sections.every((section) => section.models.length === 0)) {
    throw new DomainError('MODEL_CARD_INVALID', 'The model card holds no .model statement; nothing was stored', 400, 'card', [{ row: 1, field: 'card', message: 'No .model statement' }]);
  }
  return storedCard(check.card, mapping ?? guessCardMapping(check.card, mappingTarget(definition)), definition);
}

/** The card re-emitted with its hash, once its mapping fits the version (400 MODEL_CARD_MAPPING_INVALID otherwise). */
export function storedCard(card: ModelCard, mapping: ModelCardMapping, definition: Process): StoredCard {
  assertMappingFits(card, mapping, definition);
  const text = emitModelCard(card);
  return { text, sha256: createHash('sha256').update(text).digest('hex'), mapping };
}

/** 400 MODEL_CARD_MAPPING_INVALID with every wrong entry when the mapping does not fit this card and version. */
export function assertMappingFits(card: ModelCard, mapping: ModelCardMapping, definition: Process): void {
  const problems = cardMappingProblems(card, mapping, mappingTarget(definition));
  if (problems.length > 0) {
    throw new DomainError(
      'MODEL_CARD_MAPPING_INVALID',
      `The model card's mapping has ${count(problems.length)}: ${problems[0].message}; nothing was stored`,
      400,
      problems[0].field,
      problems.map((p) => ({ field: p.field, message: p.message })),
    );
  }
}

function count(problems: number): string {
  return problems === 1 ? 'a problem' : `${problems} problems`;
}

/** Parsed stored cards by hash (a version's summary shows its sections; the text is parsed once per server). */
const parsedCards = new Map<string, ModelCard>();
const PARSED_CARDS_KEPT = 32;

/** A stored card parsed again (it is our own re-emitted text, so it always parses). */
export function parsedStoredCard(card: Pick<StoredCard, 'text' | 'sha256'>): ModelCard {
  const known = parsedCards.get(card.sha256);
  if (known) return known;
  const parsed = parseModelCard(card.text);
  if (parsedCards.size >= PARSED_CARDS_KEPT) parsedCards.delete(parsedCards.keys().next().value as string);
  parsedCards.set(card.sha256, parsed);
  return parsed;
}

/** What a version shows of its card. */
export function cardSummary(card: StoredCard): ModelCardSummary {
  return { sha256: card.sha256, bytes: Buffer.byteLength(card.text), sections: cardSections(parsedStoredCard(card)), mapping: card.mapping };
}

/** A card checked without storing it: its problems by line, else its sections and its mapping (given or guessed) with that mapping's problems. */
export function checkUploadedCard(text: string, mapping: ModelCardMapping | undefined, definition: Process): ModelCardCheck {
  const check = checkModelCard(text);
  if (!check.card) return { ok: false, problems: check.problems.map((p) => ({ line: p.line, field: 'card', message: p.reason })), card: null };
  const target = mappingTarget(definition);
  const chosen = mapping ?? guessCardMapping(check.card, target);
  const problems = cardMappingProblems(check.card, chosen, target);
  if (check.card.sections.every((section) => section.models.length === 0)) problems.unshift({ line: 1, field: 'card', message: 'The card holds no .model statement' });
  const emitted = emitModelCard(check.card);
  return {
    ok: problems.length === 0,
    problems,
    card: { sha256: createHash('sha256').update(emitted).digest('hex'), bytes: Buffer.byteLength(emitted), sections: cardSections(check.card), mapping: chosen },
  };
}
