import * as c from '../carbonation';
import * as u from '../uncertainty';
import * as audit from '../table-audit';
import { arg, CatalogueEntry, json, jsonArg, num, numericEntry as e, opt, optionalArg, text } from './catalogue-entry';

/** Catalogue of the carbonation, uncertainty and table-audit functions. */
export const CARBONATION_ENTRIES: CatalogueEntry[] = [
  e('co2VolumesPerAtm', "CO2 volumes dissolved per atm (Henry's law)", [num('temperature', '°C')], 'vol/atm', c.co2VolumesPerAtm),
  e('gaugePressureForVolumes', 'gauge pressure holding a CO2 content', [num('volumes', 'vol'), num('temperature', '°C')], 'bar', c.gaugePressureForVolumes),
  e('volumesAtGaugePressure', 'CO2 content held by a gauge pressure', [num('gaugeBar', 'bar'), num('temperature', '°C')], 'vol', c.volumesAtGaugePressure),
  e('barToPsi', 'bar to psi', [num('bar', 'bar')], 'psi', c.barToPsi),
  e('residualCo2', 'CO2 left after fermentation', [num('highestTemperature', '°C')], 'vol', c.residualCo2),
  {
    name: 'primingSugar', summary: 'priming sugar for a target CO2 content, with the implied warm-bottle pressure',
    parameters: [num('litres', 'L'), num('targetVolumes', 'vol'), num('highestTemperature', '°C'), text('sugar', Object.keys(c.PRIMING_SUGARS).join(' | ')), opt('storageTemperature', '°C')],
    returns: '{residualVolumes, grams g, gramsPerLitre g/L, impliedGaugeBar bar, aboveCommonBottleLimit}',
    call: (a) => c.primingSugar(arg(a, 'litres'), arg(a, 'targetVolumes'), arg(a, 'highestTemperature'), (a['sugar'] as c.PrimingSugar | undefined) ?? 'sucrose', optionalArg(a, 'storageTemperature')),
  },
  e('kegPressure', 'keg pressure for a CO2 target at a serving temperature', [num('targetVolumes', 'vol'), num('servingTemperature', '°C')],
    '{gaugeBar bar, gaugePsi psi, aboveCommonKegRelief}', c.kegPressure),
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
