import { AbstractControl, NonNullableFormBuilder, ValidationErrors, Validators } from '@angular/forms';
import { CATALOGUE_LIMITS, FermentableKind, Flocculation, HopForm, IngredientKind, NAME_MAX_LENGTH, NumberLimit, OtherAdditionKind } from '@shared/recipes';
import { CatalogueEntryInput } from '../catalogue-entry';

const within = ({ min, max }: NumberLimit) => [Validators.min(min), Validators.max(max)];
const required = (limit: NumberLimit) => [Validators.required, ...within(limit)];
const name = [Validators.required, Validators.maxLength(NAME_MAX_LENGTH)];
const L = CATALOGUE_LIMITS;

/** The lower end of a range must not be above the upper end. */
function orderedRange(minKey: string, maxKey: string, error: string) {
  return (group: AbstractControl): ValidationErrors | null => {
    const min = group.get(minKey)?.value as number | null;
    const max = group.get(maxKey)?.value as number | null;
    return min !== null && max !== null && min > max ? { [error]: true } : null;
  };
}

/** One form group per kind, with the same bounds the server checks. */
export function entryFormGroups(fb: NonNullableFormBuilder) {
  return {
    fermentables: fb.group({
      name: fb.control('', name),
      kind: fb.control<FermentableKind>('grain', Validators.required),
      extractPercent: fb.control<number | null>(null, required(L.extractPercent)),
      colourLovibond: fb.control<number | null>(null, required(L.colourLovibond)),
      maxSharePercent: fb.control<number | null>(null, within(L.maxSharePercent)),
    }),
    hops: fb.group({
      name: fb.control('', name),
      alphaAcidPercent: fb.control<number | null>(null, required(L.alphaAcidPercent)),
      form: fb.control<HopForm>('pellet', Validators.required),
    }),
    yeasts: fb.group(
      {
        name: fb.control('', name),
        attenuationMinPercent: fb.control<number | null>(null, required(L.attenuationPercent)),
        attenuationMaxPercent: fb.control<number | null>(null, required(L.attenuationPercent)),
        temperatureMinC: fb.control<number | null>(null, required(L.temperatureC)),
        temperatureMaxC: fb.control<number | null>(null, required(L.temperatureC)),
        flocculation: fb.control<Flocculation>('medium', Validators.required),
      },
      {
        validators: [
          orderedRange('attenuationMinPercent', 'attenuationMaxPercent', 'attenuationOrder'),
          orderedRange('temperatureMinC', 'temperatureMaxC', 'temperatureOrder'),
        ],
      },
    ),
    others: fb.group({
      name: fb.control('', name),
      kind: fb.control<OtherAdditionKind>('other', Validators.required),
    }),
  };
}

export type EntryFormGroups = ReturnType<typeof entryFormGroups>;

/** The valid group of a kind as the API's input for that kind. */
export function entryInputOf(kind: IngredientKind, groups: EntryFormGroups): CatalogueEntryInput {
  switch (kind) {
    case 'fermentables': {
      const v = groups.fermentables.getRawValue();
      return { ...v, name: v.name.trim(), extractPercent: v.extractPercent ?? 0, colourLovibond: v.colourLovibond ?? 0 };
    }
    case 'hops': {
      const v = groups.hops.getRawValue();
      return { ...v, name: v.name.trim(), alphaAcidPercent: v.alphaAcidPercent ?? 0 };
    }
    case 'yeasts': {
      const v = groups.yeasts.getRawValue();
      return {
        ...v,
        name: v.name.trim(),
        attenuationMinPercent: v.attenuationMinPercent ?? 0,
        attenuationMaxPercent: v.attenuationMaxPercent ?? 0,
        temperatureMinC: v.temperatureMinC ?? 0,
        temperatureMaxC: v.temperatureMaxC ?? 0,
      };
    }
    default: {
      const v = groups.others.getRawValue();
      return { ...v, name: v.name.trim() };
    }
  }
}
