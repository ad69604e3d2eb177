import * as c from '../carbonation';
import { arg, CatalogueEntry, num, numericEntry as e, opt, optionalArg, text } from './catalogue-entry';

/** Catalogue of the carbonation functions. */
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
];
