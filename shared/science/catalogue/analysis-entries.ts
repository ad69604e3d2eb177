import * as u from '../uncertainty';
import * as audit from '../table-audit';
import { arg, CatalogueEntry, json, jsonArg, num, numericEntry as e, opt, optionalArg } from './catalogue-entry';

/** Catalogue of the uncertainty and reference-table audit functions. */
export const ANALYSIS_ENTRIES: CatalogueEntry[] = [
  e('resolutionUncertainty', 'standard uncertainty of a reading from its resolution', [num('resolution', 'unit of the reading')], 'same unit', u.resolutionUncertainty),
  {
    name: 'hydrometerStrengthUncertainty', summary: 'strength from hydrometer readings with propagated resolution uncertainty',
    parameters: [num('ogReading', 'SG'), num('fgReading', 'SG'), opt('ogTemperature', '°C'), opt('fgTemperature', '°C'), opt('calibrationTemperature', '°C'),
      opt('hydrometerResolution', 'SG'), opt('thermometerResolution', '°C')],
    returns: '{densityBased, linearEstimate}: each {value % vol, standardUncertainty, expandedUncertainty}',
    call: (a) => u.hydrometerStrengthUncertainty({
      ogReading: arg(a, 'ogReading'), fgReading: arg(a, 'fgReading'), ogTemperature: optionalArg(a, 'ogTemperature'), fgTemperature: optionalArg(a, 'fgTemperature'),
      calibrationTemperature: optionalArg(a, 'calibrationTemperature'), hydrometerResolution: optionalArg(a, 'hydrometerResolution'), thermometerResolution: optionalArg(a, 'thermometerResolution'),
    }),
  },
  e('refractometerStrengthUncertainty', 'strength from refractometer readings with propagated resolution uncertainty',
    [num('originalBrix', '°Bx'), num('currentBrix', '°Bx'), opt('brixResolution', '°Bx'), opt('factor', '')],
    '{densityBased, linearEstimate}: each {value % vol, standardUncertainty, expandedUncertainty}', u.refractometerStrengthUncertainty),
  {
    name: 'distillateStrengthUncertainty', summary: 'beer % vol at 20 °C from a distillate analysis, with propagated resolution uncertainty',
    parameters: [num('sampleVolume', 'L'), num('madeUpVolume', 'L'), num('distillateDensity', 'kg/m³'), num('temperature', '°C'),
      opt('densityResolution', 'kg/m³'), opt('thermometerResolution', '°C'), opt('volumeResolution', 'L')],
    returns: '{value % vol, standardUncertainty, expandedUncertainty}',
    call: (a) => u.distillateStrengthUncertainty(arg(a, 'sampleVolume'), arg(a, 'madeUpVolume'), arg(a, 'distillateDensity'), arg(a, 'temperature'), {
      densityResolution: optionalArg(a, 'densityResolution'), thermometerResolution: optionalArg(a, 'thermometerResolution'), volumeResolution: optionalArg(a, 'volumeResolution'),
    }),
  },
  {
    name: 'toleranceVerdict', summary: 'whether a declared figure is within tolerance of a measured one with its expanded uncertainty',
    parameters: [num('declared', '% vol'), num('measured', '% vol'), num('expandedUncertainty', '% vol'), num('tolerance', '% vol')], returns: 'within | outside | undecided',
    call: (a) => u.toleranceVerdict(arg(a, 'declared'), { value: arg(a, 'measured'), standardUncertainty: arg(a, 'expandedUncertainty') / 2, expandedUncertainty: arg(a, 'expandedUncertainty') }, arg(a, 'tolerance')),
  },
  {
    name: 'redlichKisterExcessVolume', summary: 'excess molar volume of a Redlich–Kister expansion (Legendre form)',
    parameters: [num('moleFraction', 'mole fraction'), json('coefficients', '[A0, A1, …] cm³/mol')], returns: 'cm³/mol',
    call: (a) => audit.redlichKisterExcessVolume(arg(a, 'moleFraction'), jsonArg(a, 'coefficients')),
  },
  {
    name: 'auditDensityTable', summary: 'audit a (% mass, density) table for rows that stand out',
    parameters: [json('rows', '[{massPercent, density kg/m³}]'), num('temperature', '°C'), opt('resolution', 'kg/m³')],
    returns: '{rows, flagged: [{massPercent, density, bumpCm3PerMol, suggestedDensity, ...}], order, robustScale kg/m³}',
    call: (a) => audit.auditDensityTable(jsonArg(a, 'rows'), arg(a, 'temperature'), { resolution: optionalArg(a, 'resolution') ?? 0.01 }),
  },
];
