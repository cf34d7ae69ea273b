import { type ModelCard, ModelCardError } from './model-card.js';
import { parseModelCard } from './parse-model-card.js';

/** One refused or invalid statement of a card, by its 1-based line. */
export interface CardProblem {
  line: number;
  code: 'MODEL_CARD_REFUSED' | 'MODEL_CARD_INVALID';
  reason: string;
}

export interface CardCheck {
  /** The parsed card; null when it has a problem. */
  card: ModelCard | null;
  problems: CardProblem[];
}

/**
 * Parses a card and, when it is refused, goes on to find its other problems: the line at fault is set aside
 * (as a comment, so the lines keep their numbers) and the card read again, up to `maxProblems` problems. A designer
 * then sees every refused construct at once, each with its line, instead of one per upload.
 */
export function checkModelCard(text: string, maxProblems = 20): CardCheck {
  const lines = text.split(/\r\n|\r|\n/);
  const problems: CardProblem[] = [];
  for (;;) {
    try {
      const card = parseModelCard(lines.join('\n'));
      return { card: problems.length === 0 ? card : null, problems };
    } catch (error) {
      if (!(error instanceof ModelCardError)) throw error;
      problems.push({ line: error.line, code: error.code as CardProblem['code'], reason: error.reason });
      const index = error.line - 1;
      // A problem that setting its line aside does not remove (or a line past the end) ends the search.
      if (problems.length >= maxProblems || index < 0 || index >= lines.length || lines[index] === '*') return { card: null, problems };
      lines[index] = '*';
    }
  }
}
