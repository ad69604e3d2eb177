import { FERMENTABLE_KINDS, FLOCCULATION_LEVELS, HOP_FORMS, IngredientKind, OTHER_ADDITION_KINDS } from '@shared/recipes';

/** A figure typed in, with its unit, an optional hint and the message its range gives. */
interface NumberField {
  type: 'number';
  control: string;
  label: string;
  suffix: string;
  hint?: string;
  /** The colour in EBC under the field, for a figure in °L. */
  ebcHint?: boolean;
  error: string;
}

/** A choice from a fixed list. */
interface ChoiceField {
  type: 'choice';
  control: string;
  label: string;
  options: readonly string[];
}

export type EntryField = NumberField | ChoiceField;

/** The fields of one kind after its name, in order, and the messages of its cross-field checks. */
export interface EntryLayout {
  fields: EntryField[];
  rangeErrors: { error: string; message: string }[];
}

const percent = (control: string, label: string, hint?: string): NumberField => ({ type: 'number', control, label, suffix: '%', hint, error: 'From 0 to 100 %.' });
const celsius = (control: string, label: string): NumberField => ({ type: 'number', control, label, suffix: '°C', error: 'From −5 to 50 °C.' });
const choice = (control: string, label: string, options: readonly string[]): ChoiceField => ({ type: 'choice', control, label, options });

/** What each kind of entry asks for besides its name (the bounds are those of CATALOGUE_LIMITS). */
export const ENTRY_LAYOUTS: Record<IngredientKind, EntryLayout> = {
  fermentables: {
    fields: [
      choice('kind', 'Kind', FERMENTABLE_KINDS),
      percent('extractPercent', 'Extract potential', 'Share of its mass that becomes extract.'),
      { type: 'number', control: 'colourLovibond', label: 'Colour', suffix: '°L', ebcHint: true, error: 'From 0 to 600 °L.' },
      percent('maxSharePercent', 'Usual maximum share', 'Leave empty for no limit.'),
    ],
    rangeErrors: [],
  },
  hops: {
    fields: [percent('alphaAcidPercent', 'Alpha acids'), choice('form', 'Form', HOP_FORMS)],
    rangeErrors: [],
  },
  yeasts: {
    fields: [
      percent('attenuationMinPercent', 'Attenuation from'),
      percent('attenuationMaxPercent', 'Attenuation to'),
      celsius('temperatureMinC', 'Temperature from'),
      celsius('temperatureMaxC', 'Temperature to'),
      choice('flocculation', 'Flocculation', FLOCCULATION_LEVELS),
    ],
    rangeErrors: [
      { error: 'attenuationOrder', message: 'The attenuation range runs from the lower to the higher figure.' },
      { error: 'temperatureOrder', message: 'The temperature range runs from the lower to the higher figure.' },
    ],
  },
  others: {
    fields: [choice('kind', 'Kind', OTHER_ADDITION_KINDS)],
    rangeErrors: [],
  },
};
