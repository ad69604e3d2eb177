import * as s from '../strength';
import { CatalogueEntry, num, numericEntry as e } from './catalogue-entry';

const OG = num('og', 'SG 20/20');
const FG = num('fg', 'SG 20/20');

/** Catalogue of the beer-strength functions. */
export const STRENGTH_ENTRIES: CatalogueEntry[] = [
  e('apparentAttenuation', 'apparent attenuation', [num('originalExtract', '°P'), num('apparentExtract', '°P')], '%', s.apparentAttenuation),
  e('realAttenuation', 'real attenuation', [num('originalExtract', '°P'), num('realExtract', '°P')], '%', s.realAttenuation),
  e('realExtract', "real extract by Balling's relation", [num('originalExtract', '°P'), num('apparentExtract', '°P')], '°P', s.realExtract),
  e('alcoholByMass', "alcohol by mass by Balling's relation", [num('originalExtract', '°P'), num('realExtract', '°P')], '% m/m', s.alcoholByMass),
  e('abvLinearEstimate', 'ABV estimate by (OG − FG) × 131.25', [OG, FG], '% vol', s.abvLinearEstimate),
  e('abvNonLinearEstimate', 'ABV estimate by the non-linear formula', [OG, FG], '% vol', s.abvNonLinearEstimate),
  e('densityBasedAbv', 'density-based % vol at 20 °C', [OG, FG], '% vol', s.densityBasedAbv),
  e('strengthBreakdown', 'density-based % vol at 20 °C with every intermediate', [OG, FG],
    '{originalExtract °P, apparentExtract °P, realExtract °P, attenuations %, alcoholByMass % m/m, beerDensity20 kg/m³, ethanolDensity20 kg/m³, percentVolume20 % vol, linearEstimate, estimateGap, nonLinearEstimate, nonLinearGap}', s.strengthBreakdown),
  e('strengthFromBeerDensity', 'density-based % vol from a beer density read at t, restated to 20 °C',
    [OG, FG, num('beerDensity', 'kg/m³'), num('temperature', '°C')],
    '{originalExtract °P, apparentExtract °P, realExtract °P, alcoholByMass % m/m, ethanolDensity kg/m³, percentVolumeAtT, percentVolume20 % vol}', s.strengthFromBeerDensity),
];
