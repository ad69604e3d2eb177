import { AbstractControl, NonNullableFormBuilder, ValidationErrors, Validators } from '@angular/forms';
import { FermentableKind, Flocculation, HopForm, IngredientKind, OtherAdditionKind } from '@shared/recipes';
import { CatalogueEntryInput } from '../catalogue-entry';

const percent = [Validators.required, Validators.min(0), Validators.max(100)];

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
      name: fb.control('', [Validators.required, Validators.maxLength(100)]),
      kind: fb.control<FermentableKind>('grain', Validators.required),
      extractPercent: fb.control<number | null>(null, percent),
      colourLovibond: fb.control<number | null>(null, [Validators.required, Validators.min(0), Validators.max(600)]),
      maxSharePercent: fb.control<number | null>(null, [Validators.min(0), Validators.max(100)]),
    }),
    hops: fb.group({
      name: fb.control('', [Validators.required, Validators.maxLength(100)]),
      alphaAcidPercent: fb.control<number | null>(null, [Validators.required, Validators.min(0), Validators.max(100)]),
      form: fb.control<HopForm>('pellet', Validators.required),
    }),
    yeasts: fb.group(
      {
        name: fb.control('', [Validators.required, Validators.maxLength(100)]),
        attenuationMinPercent: fb.control<number | null>(null, percent),
        attenuationMaxPercent: fb.control<number | null>(null, percent),
        temperatureMinC: fb.control<number | null>(null, [Validators.required, Validators.min(-5), Validators.max(50)]),
        temperatureMaxC: fb.control<number | null>(null, [Validators.required, Validators.min(-5), Validators.max(50)]),
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
      name: fb.control('', [Validators.required, Validators.maxLength(100)]),
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
