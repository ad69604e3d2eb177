import { findMalformedValue, MAX_BODY_DEPTH } from './well-formed-body';

describe('findMalformedValue', () => {
  it('when a nested string holds a lone surrogate, then it names that field', () => {
    expect(findMalformedValue({ design: { mashSteps: [{ name: 'ok' }, { name: 'bad \ud800' }] } })).toEqual({
      field: 'design.mashSteps.1.name',
      reason: 'must be well-formed Unicode text',
    });
  });

  it('when a key holds a lone surrogate, then it is refused', () => {
    expect(findMalformedValue({ notes: { ['\udc00']: 1 } })?.field).toBe('notes');
  });

  it('when text holds a proper surrogate pair (an emoji), then it is accepted', () => {
    expect(findMalformedValue({ name: 'Stout \ud83c\udf7a', list: [1, null, true] })).toBeNull();
  });

  it('when the body is nested deeper than the limit, then it is refused without overflowing the stack', () => {
    let deep: unknown = 'x';
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(findMalformedValue(deep)?.reason).toMatch(`${MAX_BODY_DEPTH} levels`);
  });
});
