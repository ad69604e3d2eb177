import * as g from '../gravity';
import * as w from '../water-density';
import * as u from '../units';
import { CatalogueEntry, num, numericEntry as e, opt } from './catalogue-entry';

/** Catalogue of the gravity, water-density and unit functions. */
export const GRAVITY_ENTRIES: CatalogueEntry[] = [
  e('platoFromSg', '°Plato from SG 20/20 °C', [num('sg', 'SG 20/20')], '°P', g.platoFromSg),
  e('sgFromPlato', 'SG 20/20 °C from °Plato', [num('plato', '°P')], 'SG 20/20', g.sgFromPlato),
  e('brixFromSg', '°Brix from SG 20/20 °C', [num('sg', 'SG 20/20')], '°Bx', g.brixFromSg),
  e('sgFromBrix', 'SG 20/20 °C from °Brix', [num('brix', '°Bx')], 'SG 20/20', g.sgFromBrix),
  e('restateSpecificGravity', 'SG t1/t1 restated as SG t2/t2', [num('sg', 'SG'), num('from', '°C'), num('to', '°C')], 'SG', g.restateSpecificGravity),
  e('sg6060FromSg2020', 'SG 60/60 °F from SG 20/20 °C', [num('sg', 'SG 20/20')], 'SG 60/60', g.sg6060FromSg2020),
  e('sg2020FromSg6060', 'SG 20/20 °C from SG 60/60 °F', [num('sg', 'SG 60/60')], 'SG 20/20', g.sg2020FromSg6060),
  e('hydrometerTemperatureCorrection', 'hydrometer reading corrected to its calibration temperature',
    [num('reading', 'SG'), num('sampleTemperature', '°C'), opt('calibrationTemperature', '°C')], 'SG', g.hydrometerTemperatureCorrection),
  e('sgFromRefractometer', 'wort SG from a refractometer reading', [num('brix', '°Bx'), opt('wortCorrectionFactor', '')], 'SG 20/20', g.sgFromRefractometer),
  e('wortCorrectionFactor', 'refractometer wort correction factor from a paired hydrometer reading',
    [num('brix', '°Bx'), num('hydrometerSg', 'SG 20/20')], '', g.wortCorrectionFactor),
  e('alcoholCorrectedGravity', 'gravity of fermenting wort from original and current °Bx (Terrill cubic)',
    [num('originalBrix', '°Bx'), num('currentBrix', '°Bx'), opt('factor', '')], 'SG', g.alcoholCorrectedGravity),
  e('waterDensity', 'density of water (Tanaka et al. 2001)', [num('temperature', '°C')], 'kg/m³', w.waterDensity),
  e('celsiusToFahrenheit', '°C to °F', [num('celsius', '°C')], '°F', u.celsiusToFahrenheit),
  e('fahrenheitToCelsius', '°F to °C', [num('fahrenheit', '°F')], '°C', u.fahrenheitToCelsius),
  e('litresToUsGallons', 'L to US gal', [num('litres', 'L')], 'gal', u.litresToUsGallons),
  e('usGallonsToLitres', 'US gal to L', [num('gallons', 'gal')], 'L', u.usGallonsToLitres),
  e('kilogramsToPounds', 'kg to lb', [num('kilograms', 'kg')], 'lb', u.kilogramsToPounds),
  e('poundsToKilograms', 'lb to kg', [num('pounds', 'lb')], 'kg', u.poundsToKilograms),
  e('gramsToOunces', 'g to oz', [num('grams', 'g')], 'oz', u.gramsToOunces),
  e('ouncesToGrams', 'oz to g', [num('ounces', 'oz')], 'g', u.ouncesToGrams),
  e('kgPerCubicMetreToGramsPerCubicCentimetre', 'kg/m³ to g/cm³', [num('density', 'kg/m³')], 'g/cm³', u.kgPerCubicMetreToGramsPerCubicCentimetre),
];
