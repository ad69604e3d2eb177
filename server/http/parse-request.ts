import { z } from 'zod';
import { AppError } from '../errors/app-error';

/** Validates `input` against `schema`; a failure is a 400 naming each field and its reason. */
export function parseRequest<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const fields: Record<string, string> = {};
  for (const issue of result.error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) fields[[...issue.path, key].join('.')] ??= 'is not a known field';
      continue;
    }
    const field = issue.path.length ? issue.path.join('.') : 'body';
    fields[field] ??= issue.message;
  }
  const names = Object.keys(fields).join(', ');
  throw new AppError('validation-failed', `Please check these fields: ${names}.`, 400, fields);
}

/** Decimal digits only: `Number()` would also take `0x10`, `1e3` and `' 1'`. */
const DECIMAL_ID = /^[1-9][0-9]{0,15}$/;

/** A positive integer id from a route parameter (decimal digits only), or a 400 naming the parameter. */
export function parseId(value: unknown, name: string): number {
  const id = typeof value === 'string' && DECIMAL_ID.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(id)) {
    throw new AppError('validation-failed', `${name} must be a positive whole number.`, 400, { [name]: 'must be a positive whole number' });
  }
  return id;
}
