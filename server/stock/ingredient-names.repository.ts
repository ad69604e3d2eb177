import { Knex } from 'knex';

/**
 * Adds the ingredient's kind and catalogue name to a query over a table with an ingredient id
 * column (used by the stock repositories; every identity has exactly one catalogue entry).
 */
export function joinIngredientNames(db: Knex, query: Knex.QueryBuilder, ingredientIdColumn: string): Knex.QueryBuilder {
  return query
    .join('ingredients as ing', 'ing.id', ingredientIdColumn)
    .leftJoin('fermentables as name_f', 'name_f.ingredient_id', 'ing.id')
    .leftJoin('hops as name_h', 'name_h.ingredient_id', 'ing.id')
    .leftJoin('yeasts as name_y', 'name_y.ingredient_id', 'ing.id')
    .leftJoin('other_additions as name_o', 'name_o.ingredient_id', 'ing.id')
    .select('ing.kind as ingredient_kind', db.raw('COALESCE(name_f.name, name_h.name, name_y.name, name_o.name) as ingredient_name'));
}
