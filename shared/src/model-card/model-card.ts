import { EngineError } from '../device/errors.js';

/** The MOSFET model levels a card may use: SPICE levels 1, 2, 3, BSIM3 (8, 49) and BSIM4 (14, 54). */
export const ACCEPTED_LEVELS: readonly number[] = [1, 2, 3, 8, 49, 14, 54];

export type ModelPolarity = 'nmos' | 'pmos';

/** One `.model` statement as parsed: names lower-case (SPICE is case-insensitive), every parameter a plain number. */
export interface ModelStatement {
  name: string;
  polarity: ModelPolarity;
  /** 1 when the statement gives no level (SPICE's default). */
  level: number;
  /** BSIM's version parameter (a dotted number such as "4.8.2"), the only parameter that is not a number. */
  version?: string;
  /** Lower-case parameter name → value in SI units, in the order the card gave them (level and version excluded). */
  parameters: Record<string, number>;
}

/** The models of one `.lib <name>` … `.endl` section; name null for statements outside any section. */
export interface CardSection {
  name: string | null;
  models: ModelStatement[];
}

/** A parsed model card: its sections in order of appearance (the unnamed one first when the card has one). */
export interface ModelCard {
  sections: CardSection[];
}

/**
 * A card that is refused: a construct outside the accepted subset (MODEL_CARD_REFUSED) or an accepted
 * construct written wrongly (MODEL_CARD_INVALID), with the 1-based line and the plain reason.
 */
export class ModelCardError extends EngineError {
  readonly line: number;
  readonly reason: string;

  constructor(code: 'MODEL_CARD_REFUSED' | 'MODEL_CARD_INVALID', line: number, reason: string) {
    super(code, `Line ${line}: ${reason}`, 'card');
    this.line = line;
    this.reason = reason;
  }
}
