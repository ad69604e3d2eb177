import { fileStem, parseRecipeFile } from './recipe-file';

describe('parseRecipeFile', () => {
  it('refuses text that is not JSON', () => {
    expect(parseRecipeFile('name,kind')).toEqual({ ok: false, message: 'This file is not JSON, so it is not a recipe file.' });
  });

  it('refuses another format version', () => {
    const result = parseRecipeFile(JSON.stringify({ format: 'commonwort-recipe', formatVersion: 3, design: { name: 'x' } }));

    expect(result).toEqual({ ok: false, message: 'This recipe file has format version 3; versions 1 and 2 can be read.' });
  });

  it('accepts a file of this format', () => {
    const file = { format: 'commonwort-recipe', formatVersion: 1, exportedAt: '2026-11-30T18:00:00Z', design: { name: 'Pale' } };

    expect(parseRecipeFile(JSON.stringify(file))).toEqual({ ok: true, file });
  });
});

describe('fileStem', () => {
  it('keeps letters and digits and joins the rest with dashes', () => {
    expect(fileStem('  Fernhollow Pale #2! ')).toBe('fernhollow-pale-2');
  });
});
