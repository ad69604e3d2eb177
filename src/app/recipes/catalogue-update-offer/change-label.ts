import { SnapshotChange } from '@shared/recipes';

const FIELD_NAMES: Record<string, string> = {
  name: 'name',
  kind: 'kind',
  extractPercent: 'extract (%)',
  colourLovibond: 'colour (°L)',
  maxSharePercent: 'usual maximum share (%)',
  alphaAcidPercent: 'alpha acid (%)',
  form: 'form',
  attenuationMinPercent: 'lowest attenuation (%)',
  attenuationMaxPercent: 'highest attenuation (%)',
  temperatureMinC: 'lowest temperature (°C)',
  temperatureMaxC: 'highest temperature (°C)',
  flocculation: 'flocculation',
  boilOffLitresPerHour: 'boil-off (L/h)',
  grainAbsorptionLitresPerKg: 'grain absorption (L/kg)',
  kettleLossLitres: 'kettle loss (L)',
  fermenterLossLitres: 'fermenter loss (L)',
  mashThicknessLitresPerKg: 'mash thickness (L/kg)',
  grainTemperatureC: 'grain temperature (°C)',
  mashTunHeatCapacityKjPerK: 'mash tun heat capacity (kJ/K)',
};

const shown = (value: unknown) => (value === null || value === undefined ? 'none' : String(value));

/** One change in words, e.g. "Citra pellets: alpha acid (%) 6.5 → 8". */
export function changeLabel(change: SnapshotChange): string {
  const subject = change.source === 'brewhouse' ? 'Brewhouse' : change.name;
  return `${subject}: ${FIELD_NAMES[change.field] ?? change.field} ${shown(change.was)} → ${shown(change.now)}`;
}
