/** The co-op's ingredient catalogue. Amounts and properties are stored in SI units. */
export const FERMENTABLE_KINDS = ['grain', 'extract', 'sugar', 'adjunct'] as const;
export type FermentableKind = (typeof FERMENTABLE_KINDS)[number];

export const HOP_FORMS = ['pellet', 'whole', 'extract'] as const;
export type HopForm = (typeof HOP_FORMS)[number];

export const FLOCCULATION_LEVELS = ['low', 'medium', 'high'] as const;
export type Flocculation = (typeof FLOCCULATION_LEVELS)[number];

export const OTHER_ADDITION_KINDS = ['spice', 'fining', 'water agent', 'flavouring', 'other'] as const;
export type OtherAdditionKind = (typeof OTHER_ADDITION_KINDS)[number];

export const INGREDIENT_KINDS = ['fermentables', 'hops', 'yeasts', 'others'] as const;
export type IngredientKind = (typeof INGREDIENT_KINDS)[number];

export interface Fermentable {
  id: number;
  /** The identity shared by every kind of ingredient (stock and shopping lists refer to it). */
  ingredientId: number;
  name: string;
  kind: FermentableKind;
  /** Extract yield, % of the ingredient's mass as used (e.g. 80 for a typical pale malt, 100 for sugar). */
  extractPercent: number;
  /** Colour in degrees Lovibond (°L); the client shows EBC too. */
  colourLovibond: number;
  /** The usual maximum share of the grain bill, % by mass; null when no limit applies. */
  maxSharePercent: number | null;
  retired: boolean;
}

export interface Hop {
  id: number;
  /** The identity shared by every kind of ingredient (stock and shopping lists refer to it). */
  ingredientId: number;
  name: string;
  alphaAcidPercent: number;
  form: HopForm;
  retired: boolean;
}

export interface Yeast {
  id: number;
  /** The identity shared by every kind of ingredient (stock and shopping lists refer to it). */
  ingredientId: number;
  name: string;
  attenuationMinPercent: number;
  attenuationMaxPercent: number;
  temperatureMinC: number;
  temperatureMaxC: number;
  flocculation: Flocculation;
  retired: boolean;
}

export interface OtherAddition {
  id: number;
  /** The identity shared by every kind of ingredient (stock and shopping lists refer to it). */
  ingredientId: number;
  name: string;
  kind: OtherAdditionKind;
  retired: boolean;
}

/** The whole catalogue as GET /api/ingredients returns it. */
export interface IngredientCatalogue {
  fermentables: Fermentable[];
  hops: Hop[];
  yeasts: Yeast[];
  others: OtherAddition[];
}

/** New or changed entries: everything but id; `retired` is changed with PATCH only. */
export type FermentableInput = Omit<Fermentable, 'id' | 'ingredientId' | 'retired'>;
export type HopInput = Omit<Hop, 'id' | 'ingredientId' | 'retired'>;
export type YeastInput = Omit<Yeast, 'id' | 'ingredientId' | 'retired'>;
export type OtherAdditionInput = Omit<OtherAddition, 'id' | 'ingredientId' | 'retired'>;

/** Where one catalogue entry is used: a recipe and which of its versions contain it. */
export interface IngredientUse {
  recipeId: number;
  recipeName: string;
  ownerName: string;
  currentVersion: number;
  /** Versions containing the entry, newest first. */
  versions: number[];
  /** True when the recipe's current version contains it and the recipe is not archived. */
  inCurrentRecipe: boolean;
}

/** GET /api/ingredients/:kind/:ingredientId/used-in. */
export interface IngredientUsage {
  uses: IngredientUse[];
  /** Private recipes of other members that use the entry; counted, not named. */
  hiddenRecipeCount: number;
  /** How many of those use it in their current version. */
  hiddenCurrentRecipeCount: number;
}
