import type { CONSTRAINTS, MODELS } from '@channelwright/shared/schemas';
import type { Polarity } from '@channelwright/shared/schemas';

export type Constraint = (typeof CONSTRAINTS)[number];
export type CurrentModel = (typeof MODELS)[number];

/**
 * The targets form as the designer types it: quantities are text ("20u", "0.5 µm") until sent.
 * All four constraint fields are kept, so switching between them loses nothing; only the chosen
 * one is sent.
 */
export interface TargetsValues {
  polarity: Polarity;
  /** '' for the standard device of the polarity. */
  flavour: string;
  model: CurrentModel;
  corner: string;
  temperature: string;
  id: string;
  l: string;
  vds: string;
  vsb: string;
  constraint: Constraint;
  vov: string;
  gmId: string;
  w: string;
  vgs: string;
}

/** The quantity fields of the form, each under the name the compute API gives it. */
export type QuantityField = 'temperature' | 'id' | 'l' | 'vds' | 'vsb' | Constraint;

export const DEFAULT_TARGETS: TargetsValues = {
  polarity: 'nmos',
  flavour: '',
  model: 'all-region',
  corner: 'TT',
  temperature: '27',
  id: '',
  l: '',
  vds: '0.9',
  vsb: '0',
  constraint: 'vov',
  vov: '',
  gmId: '',
  w: '',
  vgs: '',
};
