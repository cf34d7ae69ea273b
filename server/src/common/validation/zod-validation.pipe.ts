import { Injectable, type PipeTransform } from '@nestjs/common';
import type { z } from 'zod';
import { validationError } from './zod-issues.js';

/** Validates (and transforms) a body, query or param with a shared zod schema: `@Body(new ZodValidationPipe(schema))`. */
@Injectable()
export class ZodValidationPipe<S extends z.ZodType> implements PipeTransform<unknown, z.output<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown): z.output<S> {
    const result = this.schema.safeParse(value);
    if (!result.success) throw validationError(result.error);
    return result.data;
  }
}
