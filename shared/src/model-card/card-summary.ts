import type { ModelCardSummary } from '../schemas/model-card.js';
import type { ModelCard } from './model-card.js';

/** The sections of a parsed card and their models, as a process version shows them (no parameter values). */
export function cardSections(card: ModelCard): ModelCardSummary['sections'] {
  return card.sections.map((section) => ({
    name: section.name,
    models: section.models.map((model) => ({
      name: model.name,
      polarity: model.polarity,
      level: model.level,
      ...(model.version === undefined ? {} : { version: model.version }),
      parameterCount: Object.keys(model.parameters).length,
    })),
  }));
}
