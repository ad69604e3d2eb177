import * as ew from '../ethanol-water';
import { CatalogueEntry, num, numericEntry as e, opt } from './catalogue-entry';

const P = num('massFraction', 'mass fraction 0–1');
const T = num('temperature', '°C');

/** Catalogue of the ethanol–water functions. */
export const ETHANOL_WATER_ENTRIES: CatalogueEntry[] = [
  e('ethanolWaterDensity', 'density of an ethanol–water mixture (OIML R 22)', [P, T], 'kg/m³', ew.ethanolWaterDensity),
  e('pureEthanolDensity', 'density of pure ethanol (OIML R 22)', [T], 'kg/m³', ew.pureEthanolDensity),
  e('oimlWaterDensity', 'density of pure water by the OIML R 22 equation', [T], 'kg/m³', ew.oimlWaterDensity),
  e('massFractionFromEthanolConcentration', 'mass fraction from ethanol g/L at t', [num('gramsPerLitre', 'g/L'), T], 'mass fraction', ew.massFractionFromEthanolConcentration),
  e('massFractionFromDensity', 'mass fraction from density and temperature', [num('density', 'kg/m³'), T], 'mass fraction', ew.massFractionFromDensity),
  e('percentVolumeFromMassFraction', '% vol at t from mass fraction', [P, T], '% vol', ew.percentVolumeFromMassFraction),
  e('massFractionFromPercentVolume', 'mass fraction from % vol at t', [num('percentVolume', '% vol'), T], 'mass fraction', ew.massFractionFromPercentVolume),
  e('ethanolGramsPerLitre', 'ethanol g/L at t', [P, T], 'g/L', ew.ethanolGramsPerLitre),
  e('moleFractionFromMassFraction', 'mole fraction from mass fraction', [P], 'mole fraction', ew.moleFractionFromMassFraction),
  e('massFractionFromMoleFraction', 'mass fraction from mole fraction', [num('moleFraction', 'mole fraction')], 'mass fraction', ew.massFractionFromMoleFraction),
  e('volumeFractionBeforeMixing', 'volume fraction before mixing at t', [P, T], 'volume fraction', ew.volumeFractionBeforeMixing),
  e('massFractionFromVolumeFractionBeforeMixing', 'mass fraction from a volume fraction before mixing',
    [num('volumeFraction', 'volume fraction'), T], 'mass fraction', ew.massFractionFromVolumeFractionBeforeMixing),
  e('restatePercentVolume', '% vol at one temperature restated at another',
    [num('percentVolume', '% vol'), num('fromTemperature', '°C'), num('toTemperature', '°C')], '% vol', ew.restatePercentVolume),
  e('excessMolarVolume', 'excess molar volume (OIML R 22)', [P, T], 'cm³/mol', ew.excessMolarVolume),
  e('excessMolarVolumeFromDensities', 'excess molar volume from a mixture density and the pure densities',
    [num('moleFraction', 'mole fraction'), num('mixtureDensity', 'kg/m³'), num('ethanolDensity', 'kg/m³'), num('waterDensity', 'kg/m³')], 'cm³/mol', ew.excessMolarVolumeFromDensities),
  e('ethanolVolumeInStock', 'volume of pure ethanol at t in a stock', [num('volume', 'L'), num('percentVolume', '% vol'), opt('temperature', '°C')], 'L', ew.ethanolVolumeInStock),
  e('mixContraction', 'volume and contraction after mixing ethanol and water',
    [num('ethanolVolume', 'L'), num('waterVolume', 'L'), T], '{massFraction, percentVolume, finalVolume L, contractionVolume L, contractionPercent}', ew.mixContraction),
  e('dilutionWithWater', 'water to add to reach a target % vol, and the final volume',
    [num('volume', 'L'), num('percentVolume', '% vol'), num('targetPercentVolume', '% vol'), opt('temperature', '°C')],
    '{addedVolume L, finalVolume L, finalPercentVolume, contractionVolume L}', ew.dilutionWithWater),
  e('blendToTarget', 'second mixture to add to reach a target % vol',
    [num('volume', 'L'), num('percentVolume', '% vol'), num('addPercentVolume', '% vol'), num('targetPercentVolume', '% vol'), opt('temperature', '°C')],
    '{addedVolume L, finalVolume L, finalPercentVolume, contractionVolume L}', ew.blendToTarget),
  e('analyseDistillate', "beer's % vol at 20 °C from a distillate's density",
    [num('sampleVolume', 'L'), num('madeUpVolume', 'L'), num('distillateDensity', 'kg/m³'), T],
    '{distillateMassFraction, distillatePercentVolume20, beerPercentVolume20, aboveBeerRange}', ew.analyseDistillate),
];
