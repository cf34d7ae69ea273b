/**
 * SPICE model cards: the accepted subset parsed into plain statements, and re-emitted as our own text,
 * so that a simulator only ever sees what Channelwright wrote. Subset and reasons: docs/characterisation.md.
 */
export { ACCEPTED_LEVELS, type CardSection, type ModelCard, ModelCardError, type ModelPolarity, type ModelStatement } from './model-card.js';
export { parseModelCard } from './parse-model-card.js';
export { emitModel, emitModelCard, spiceNumber } from './emit-model-card.js';
export { parseSpiceNumber } from './spice-number.js';
export { type CardCheck, type CardProblem, checkModelCard } from './check-model-card.js';
export { cardSections } from './card-summary.js';
export { type MappingTarget, cardMappingProblems, guessCardMapping } from './card-mapping.js';
