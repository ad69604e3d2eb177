import { z } from 'zod';
import { AppError } from '../errors/app-error';
import { parseId, parseRequest } from './parse-request';

describe('parseRequest', () => {
  const schema = z.object({ email: z.email('must be an e-mail address'), count: z.number('must be a number').min(1, 'must be at least 1') });

  it('when the input is valid, then it returns the parsed value', () => {
    expect(parseRequest(schema, { email: 'a@b.example', count: 2 })).toEqual({ email: 'a@b.example', count: 2 });
  });

  it('when fields are wrong, then it throws a 400 AppError naming each field with its reason', () => {
    let thrown: unknown;
    try {
      parseRequest(schema, { email: 'nope', count: 0 });
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(AppError);
    expect(thrown).toMatchObject({ status: 400, code: 'validation-failed', fields: { email: 'must be an e-mail address', count: 'must be at least 1' } });
  });

  it('when the body is missing, then every required field is named', () => {
    expect(() => parseRequest(schema, undefined)).toThrow(expect.objectContaining({ fields: { email: expect.any(String), count: expect.any(String) } }));
  });
});

describe('parseRequest with a strict schema', () => {
  it('when the body has unknown keys, then each is named as not a known field', () => {
    const strict = z.object({ name: z.string() }).strict();
    expect(() => parseRequest(strict, { name: 'x', extra: 1, deep: { a: 1 } })).toThrow(
      expect.objectContaining({ status: 400, fields: { extra: 'is not a known field', deep: 'is not a known field' } }),
    );
  });
});

describe('parseId', () => {
  it.each(['0', '-3', '1.5', 'abc', '', '0x10', '1e3', '1 ', ' 1', '+1', '01', '99999999999999999'])('when the id is %p, then it throws a 400 naming the parameter', (raw) => {
    expect(() => parseId(raw, 'memberId')).toThrow(expect.objectContaining({ status: 400, fields: { memberId: 'must be a positive whole number' } }));
  });

  it('when the id is a positive integer, then it returns the number', () => {
    expect(parseId('42', 'memberId')).toBe(42);
  });
});
