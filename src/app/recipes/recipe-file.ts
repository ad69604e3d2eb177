import { RECIPE_EXPORT_FORMAT, RECIPE_EXPORT_READABLE_VERSIONS, RecipeExport } from '@shared/recipes';

/** A recipe file read from disk: the file, or why it cannot be used. */
export type ParsedRecipeFile = { ok: true; file: RecipeExport } | { ok: false; message: string };

/** First-pass check of a recipe file before it is sent; the server checks every field again. */
export function parseRecipeFile(text: string): ParsedRecipeFile {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return { ok: false, message: 'This file is not JSON, so it is not a recipe file.' };
  }
  const file = value as Partial<RecipeExport> | null;
  if (!file || typeof file !== 'object' || file.format !== RECIPE_EXPORT_FORMAT) {
    return { ok: false, message: `This is not a recipe file of this app (its "format" is not "${RECIPE_EXPORT_FORMAT}").` };
  }
  if (!(RECIPE_EXPORT_READABLE_VERSIONS as readonly unknown[]).includes(file.formatVersion)) {
    const readable = RECIPE_EXPORT_READABLE_VERSIONS.join(' and ');
    return { ok: false, message: `This recipe file has format version ${String(file.formatVersion)}; versions ${readable} can be read.` };
  }
  if (!file.design || typeof file.design !== 'object' || typeof file.design.name !== 'string') {
    return { ok: false, message: 'This recipe file has no design with a name.' };
  }
  return { ok: true, file: file as RecipeExport };
}

/** A file name from a recipe name: letters, digits and dashes only. */
export function fileStem(name: string): string {
  return name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '') || 'recipe';
}
