import * as r from '../recipe';
import { arg, CatalogueEntry, json, jsonArg, num, numericEntry as e, opt, optionalArg } from './catalogue-entry';

const BREWHOUSE = ['grainAbsorptionLitresPerKg', 'kettleLossLitres', 'fermenterLossLitres', 'mashRatioLitresPerKg', 'coolingShrinkagePercent'] as const;

/** Catalogue of the recipe-prediction functions. */
export const RECIPE_ENTRIES: CatalogueEntry[] = [
  {
    name: 'originalGravityMetric', summary: 'OG from a metric grain bill',
    parameters: [json('fermentables', '[{kilograms, extractYieldPercent}]'), num('efficiencyPercent', '%'), num('litres', 'L')], returns: 'SG 20/20',
    call: (a) => r.originalGravityMetric(jsonArg(a, 'fermentables'), arg(a, 'efficiencyPercent'), arg(a, 'litres')),
  },
  {
    name: 'originalGravityUs', summary: 'OG from a US grain bill (points per pound per gallon)',
    parameters: [json('fermentables', '[{pounds, pointsPerPoundPerGallon}]'), num('efficiencyPercent', '%'), num('gallons', 'gal')], returns: 'SG',
    call: (a) => r.originalGravityUs(jsonArg(a, 'fermentables'), arg(a, 'efficiencyPercent'), arg(a, 'gallons')),
  },
  e('finalGravityFromAttenuation', 'FG from OG and apparent attenuation', [num('og', 'SG'), num('attenuationPercent', '%')], 'SG', r.finalGravityFromAttenuation),
  {
    name: 'brewhouseVolumes', summary: 'strike, sparge, pre-boil and total water; pre-boil gravity when OG is given',
    parameters: [num('batchLitres', 'L'), num('grainKilograms', 'kg'), num('boilMinutes', 'min'), num('boilOffLitresPerHour', 'L/h'),
      opt('grainAbsorptionLitresPerKg', 'L/kg'), opt('kettleLossLitres', 'L'), opt('fermenterLossLitres', 'L'), opt('mashRatioLitresPerKg', 'L/kg'),
      opt('coolingShrinkagePercent', '%'), opt('og', 'SG')],
    returns: '{intoFermenterLitres, postBoilLitres, preBoilLitres, totalWaterLitres, strikeLitres, spargeLitres, strikeExceedsTotal, preBoilGravity}',
    call: (a) => {
      const settings: r.VolumePlanSettings = { batchLitres: arg(a, 'batchLitres'), grainKilograms: arg(a, 'grainKilograms'), boilMinutes: arg(a, 'boilMinutes'), boilOffLitresPerHour: arg(a, 'boilOffLitresPerHour') };
      for (const key of BREWHOUSE) if (a[key] !== undefined) settings[key] = arg(a, key);
      return r.brewhouseVolumes(settings, optionalArg(a, 'og'));
    },
  },
  {
    name: 'strikeWaterTemperature', summary: 'strike-water temperature for a target mash temperature, with the tun when its heat capacity is given',
    parameters: [num('targetMash', '°C'), num('grainTemperature', '°C'), num('ratioLitresPerKg', 'L/kg'), opt('grainHeatCapacity', 'relative to water'),
      opt('tunHeatCapacityKjPerK', 'kJ/K'), opt('grainKilograms', 'kg')],
    returns: '°C',
    call: (a) => {
      const tunHeat = optionalArg(a, 'tunHeatCapacityKjPerK');
      const tun = tunHeat === undefined ? undefined : { heatCapacityKjPerK: tunHeat, grainKilograms: arg(a, 'grainKilograms') };
      return r.strikeWaterTemperature(arg(a, 'targetMash'), arg(a, 'grainTemperature'), arg(a, 'ratioLitresPerKg'), optionalArg(a, 'grainHeatCapacity'), tun);
    },
  },
  e('tinsethUtilisation', "Tinseth's hop utilisation", [num('boilGravity', 'SG'), num('minutes', 'min')], 'fraction', r.tinsethUtilisation),
  {
    name: 'tinsethIbu', summary: 'IBU of one hop addition by Tinseth',
    parameters: [num('grams', 'g'), num('alphaPercent', '%'), num('minutes', 'min'), num('boilGravity', 'SG'), num('litres', 'L')], returns: 'IBU',
    call: (a) => r.tinsethIbu({ grams: arg(a, 'grams'), alphaPercent: arg(a, 'alphaPercent'), minutes: arg(a, 'minutes') }, arg(a, 'boilGravity'), arg(a, 'litres')),
  },
  {
    name: 'totalTinsethIbu', summary: 'IBU of several additions by Tinseth',
    parameters: [json('additions', '[{grams, alphaPercent, minutes}]'), num('boilGravity', 'SG'), num('litres', 'L')], returns: 'IBU',
    call: (a) => r.totalTinsethIbu(jsonArg(a, 'additions'), arg(a, 'boilGravity'), arg(a, 'litres')),
  },
  e('isomerisationRateRelativeToBoil', 'alpha-acid isomerisation rate relative to the boil (Malowicki)', [num('temperatureC', '°C')], 'fraction',
    r.isomerisationRateRelativeToBoil),
  {
    name: 'hopStandIbu', summary: 'IBU of a whirlpool or hop-stand addition (Tinseth × relative isomerisation rate)',
    parameters: [num('grams', 'g'), num('alphaPercent', '%'), num('minutes', 'min'), num('boilGravity', 'SG'), num('litres', 'L'), num('standTemperatureC', '°C')],
    returns: 'IBU',
    call: (a) => r.hopStandIbu({ grams: arg(a, 'grams'), alphaPercent: arg(a, 'alphaPercent'), minutes: arg(a, 'minutes') }, arg(a, 'boilGravity'), arg(a, 'litres'), arg(a, 'standTemperatureC')),
  },
  e('mashEfficiencyFromBrewhouse', 'mash efficiency implied by a brewhouse efficiency into the fermenter', [num('brewhouseEfficiencyPercent', '%'),
    num('intoFermenterLitres', 'L'), num('kettleLossLitres', 'L')], '%', r.mashEfficiencyFromBrewhouse),
  e('bitternessRatio', 'BU:GU', [num('ibu', 'IBU'), num('og', 'SG')], 'ratio', r.bitternessRatio),
  {
    name: 'moreyColour', summary: 'beer colour by Morey (US gallons)',
    parameters: [json('malts', '[{pounds | kilograms, lovibond}]'), num('gallons', 'gal')], returns: '{mcu, srm, ebc}',
    call: (a) => r.moreyColour(jsonArg(a, 'malts'), arg(a, 'gallons')),
  },
  e('lovibondFromEbc', 'malt colour in °L from EBC', [num('ebc', 'EBC')], '°L', r.lovibondFromEbc),
  e('ebcFromLovibond', 'malt colour in EBC from °L', [num('lovibond', '°L')], 'EBC', r.ebcFromLovibond),
  {
    name: 'moreyColourMetric', summary: 'beer colour by Morey (litres)',
    parameters: [json('malts', '[{kilograms | pounds, lovibond}]'), num('litres', 'L')], returns: '{mcu, srm, ebc}',
    call: (a) => r.moreyColourMetric(jsonArg(a, 'malts'), arg(a, 'litres')),
  },
  e('yeastCellsToPitch', 'yeast cells to pitch', [num('litres', 'L'), num('plato', '°P'), opt('ratePerMlPerPlato', 'million cells/mL/°P')], 'billion cells', r.yeastCellsToPitch),
];
