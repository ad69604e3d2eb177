import { Knex } from 'knex';
import { RecipeDesign } from '@shared/recipes';
import { CATALOGUE_KINDS } from '../catalogue/catalogue-kinds';
import { catalogueRepository } from '../catalogue/catalogue.repository';
import { AppError } from '../errors/app-error';
import { stylesRepository } from '../styles/styles.repository';

/** Throws a 400 naming each design field that points at no catalogue entry or style. */
export async function assertReferencesExist(db: Knex, design: RecipeDesign): Promise<void> {
  const fields: Record<string, string> = {};
  const check = async (kind: keyof typeof CATALOGUE_KINDS, refs: { path: string; id: number }[]) => {
    const found = await catalogueRepository.existingIds(db, CATALOGUE_KINDS[kind], refs.map((r) => r.id));
    for (const ref of refs) if (!found.has(ref.id)) fields[ref.path] = `is not in the ingredient catalogue (id ${ref.id})`;
  };
  await check('fermentables', design.fermentables.map((f, i) => ({ path: `design.fermentables.${i}.fermentableId`, id: f.fermentableId })));
  await check('hops', design.hops.map((h, i) => ({ path: `design.hops.${i}.hopId`, id: h.hopId })));
  await check('others', design.others.map((o, i) => ({ path: `design.others.${i}.otherId`, id: o.otherId })));
  if (design.yeastId !== null) await check('yeasts', [{ path: 'design.yeastId', id: design.yeastId }]);
  if (design.styleId !== null && !(await stylesRepository.findById(db, design.styleId))) {
    fields['design.styleId'] = `is not in the style list (id ${design.styleId})`;
  }
  if (Object.keys(fields).length) {
    throw new AppError('validation-failed', `Please check these fields: ${Object.keys(fields).join(', ')}.`, 400, fields);
  }
}
