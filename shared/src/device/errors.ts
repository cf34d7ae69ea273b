import type { ErrorCode } from '../schemas/error-codes.js';

/**
 * The engine's one way of saying "no physical answer": a stable string code for programs,
 * a plain sentence for people, and the input field that caused it when there is one.
 * The server maps it to a 400 with the shared error body; the engine never returns NaN instead.
 */
export class EngineError extends Error {
  readonly code: ErrorCode;
  readonly field?: string;

  constructor(code: ErrorCode, message: string, field?: string) {
    super(message);
    this.name = 'EngineError';
    this.code = code;
    this.field = field;
  }
}

export function isEngineError(value: unknown): value is EngineError {
  return value instanceof Error && (value as EngineError).name === 'EngineError' && typeof (value as EngineError).code === 'string';
}
