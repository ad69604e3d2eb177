import { hopStandIbu, tinsethIbu } from '@shared/science';
import { attempt } from './figure-attempt';
import { HOP_STAND_TEMPERATURE_C, hopTimeProblem } from './hop-timing';
import { IngredientCatalogue } from './ingredient';
import { HopItem, RecipeDesign } from './recipe-design';
import { HopBitterness } from './recipe-prediction-model';

/** IBU of one addition: Tinseth in the boil (first wort for the whole boil), a hop stand below it, none from dry hops. */
function additionIbu(hop: HopItem, alphaPercent: number, og: number, design: RecipeDesign): number {
  const addition = (minutes: number) => ({ grams: hop.amountGrams, alphaPercent, minutes });
  switch (hop.use) {
    case 'first wort':
      return tinsethIbu(addition(design.boilMinutes), og, design.batchVolumeLitres);
    case 'boil':
      return tinsethIbu(addition(hop.time), og, design.batchVolumeLitres);
    case 'whirlpool':
      return hopStandIbu(addition(hop.time), og, design.batchVolumeLitres, HOP_STAND_TEMPERATURE_C);
    default:
      return 0;
  }
}

/** The IBU of each hop addition at this OG; additions not in the catalogue or timed past the boil are named in `problems`. */
export function bitterness(design: RecipeDesign, catalogue: IngredientCatalogue, og: number, problems: string[]): HopBitterness[] {
  return design.hops.flatMap((item, index) => {
    const entry = catalogue.hops.find((each) => each.id === item.hopId);
    if (!entry) {
      problems.push(`Hop addition ${index + 1} is not in the catalogue.`);
      return [];
    }
    const timeProblem = hopTimeProblem(item, design.boilMinutes);
    if (timeProblem) {
      problems.push(`Hop addition ${index + 1}: time ${timeProblem}.`);
      return [];
    }
    const ibu = attempt(problems, `IBU of ${entry.name}`, () => additionIbu(item, entry.alphaAcidPercent, og, design));
    return ibu === null ? [] : [{ index, hopId: entry.id, name: entry.name, use: item.use, time: item.time, amountGrams: item.amountGrams, ibu }];
  });
}
