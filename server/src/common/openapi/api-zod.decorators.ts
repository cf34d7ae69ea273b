import { applyDecorators } from '@nestjs/common';
import { ApiBody, ApiResponse, type SchemaObject } from '@nestjs/swagger';
import { z } from 'zod';

/**
 * The OpenAPI schema of a zod schema, so the document comes from the same schemas the server
 * validates with. Requests are described as the client sends them (before transforms), responses as sent.
 */
export function openApiSchema(schema: z.ZodType, io: 'input' | 'output'): SchemaObject {
  return z.toJSONSchema(schema, { target: 'openapi-3.0', io, unrepresentable: 'any' }) as SchemaObject;
}

export const ApiZodBody = (schema: z.ZodType, description?: string) =>
  applyDecorators(ApiBody({ schema: openApiSchema(schema, 'input'), description }));

export const ApiZodResponse = (status: number, schema: z.ZodType, description?: string) =>
  applyDecorators(ApiResponse({ status, schema: openApiSchema(schema, 'output'), description }));
