import { z } from 'zod';
import { AppError } from '../errors/app-error';

/** Validates `input` against `schema`; a failure is a 400 naming each field and its reason. */
export function parseRequest<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const fields: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const field = issue.path.length ? issue.path.join('.') : 'body';
    fields[field] ??= issue.message;
  }
  const names = Object.keys(fields).join(', ');
  throw new AppError('validation-failed', `Please check these fields: ${names}.`, 400, fields);
}

/** A positive integer id from a route parameter, or a 400 naming the parameter. */
export function parseId(value: unknown, name: string): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0) {
    throw new AppError('validation-failed', `${name} must be a positive whole number.`, 400, { [name]: 'must be a positive whole number' });
  }
  return id;
}
