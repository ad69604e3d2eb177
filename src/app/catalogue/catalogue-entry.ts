import { Fermentable, FermentableInput, Hop, HopInput, OtherAddition, OtherAdditionInput, Yeast, YeastInput } from '@shared/recipes';

/** An entry of any kind of the catalogue. */
export type CatalogueEntry = Fermentable | Hop | Yeast | OtherAddition;

/** A new or changed entry of any kind. */
export type CatalogueEntryInput = FermentableInput | HopInput | YeastInput | OtherAdditionInput;
