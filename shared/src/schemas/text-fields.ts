import { z } from 'zod';

/** Free text, trimmed, at most `max` characters; its messages name the field. */
export const text = (field: string, max: number) =>
  z.string({ error: `${field} must be text` }).trim().max(max, `${field} must have at most ${max} characters`);

/** A name that must not be empty. */
export const label = (field: string, max: number) => text(field, max).min(1, `${field} must not be empty`);
