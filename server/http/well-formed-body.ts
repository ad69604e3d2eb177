import { RequestHandler } from 'express';
import { AppError } from '../errors/app-error';

/** Deeper JSON than any form of the app sends; deeper bodies would only cost stack and time. */
export const MAX_BODY_DEPTH = 32;

/** A high surrogate not followed by a low one, or a low one not preceded by a high one. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

function fieldName(path: (string | number)[]): string {
  return path.length ? path.join('.') : 'body';
}

/** The first problem in a parsed JSON value: a string that is not well-formed UTF-16 (a lone surrogate), or nesting too deep. */
export function findMalformedValue(value: unknown): { field: string; reason: string } | null {
  // Iterative, so a hostile nesting depth cannot overflow the stack.
  const pending: { value: unknown; path: (string | number)[] }[] = [{ value, path: [] }];
  while (pending.length) {
    const { value: current, path } = pending.pop()!;
    if (typeof current === 'string') {
      if (LONE_SURROGATE.test(current)) return { field: fieldName(path), reason: 'must be well-formed Unicode text' };
      continue;
    }
    if (current === null || typeof current !== 'object') continue;
    if (path.length >= MAX_BODY_DEPTH) return { field: fieldName(path), reason: `must not be nested more than ${MAX_BODY_DEPTH} levels deep` };
    for (const [key, child] of Object.entries(current)) {
      if (LONE_SURROGATE.test(key)) return { field: fieldName(path), reason: 'must have well-formed Unicode keys' };
      pending.push({ value: child, path: [...path, Array.isArray(current) ? Number(key) : key] });
    }
  }
  return null;
}

/** Refuses, for every API route at once, JSON bodies with malformed strings or absurd nesting: 400 naming the field. */
export const wellFormedBody: RequestHandler = (req, _res, next) => {
  const problem = findMalformedValue(req.body);
  if (!problem) return next();
  next(new AppError('validation-failed', `Please check these fields: ${problem.field}.`, 400, { [problem.field]: problem.reason }));
};
