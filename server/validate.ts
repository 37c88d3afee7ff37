// zod validation of body, query and params; failures become 400 with per-field messages.
import type { Request } from 'express';
import type { z } from 'zod';
import { badRequest, type FieldErrors } from './errors';

function fieldErrors(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export function parseWith<S extends z.ZodType>(schema: S, value: unknown, where: string): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (!result.success) {
    const fields = fieldErrors(result.error);
    const first = Object.entries(fields)[0];
    const detail = first ? ` ${first[0] === '_' ? '' : `${first[0]}: `}${first[1]}` : '';
    throw badRequest(`Invalid ${where}.${detail}`, fields);
  }
  return result.data;
}

export const body = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.body, 'request body');
export const query = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.query, 'query');
export const params = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.params, 'address');

/**
 * For PATCH: the parsed body keeps only the fields the request actually sent, so defaults in a
 * shared schema never overwrite stored values the client left out.
 */
export function patch<S extends z.ZodType>(req: Request, schema: S): Partial<z.output<S>> {
  const parsed = parseWith(schema, req.body, 'request body') as Record<string, unknown>;
  const sent = req.body && typeof req.body === 'object' ? Object.keys(req.body as object) : [];
  return Object.fromEntries(Object.entries(parsed).filter(([key]) => sent.includes(key))) as Partial<z.output<S>>;
}
