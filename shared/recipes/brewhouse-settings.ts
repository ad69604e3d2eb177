/** The co-op's brewhouse, from which each recipe's water plan follows. SI units throughout. */
export interface BrewhouseSettings {
  boilOffLitresPerHour: number;
  grainAbsorptionLitresPerKg: number;
  kettleLossLitres: number;
  fermenterLossLitres: number;
  /** Water-to-grain ratio of the mash, L/kg. */
  mashThicknessLitresPerKg: number;
  /** Temperature of the grain at mash-in, °C. */
  grainTemperatureC: number;
  /** Heat capacity of the mash tun in kJ/K when measured; null to leave it out of the heat balance. */
  mashTunHeatCapacityKjPerK: number | null;
  /** Brim-full volume of the kettle, L; null while unknown. The water plan warns when the pre-boil wort would not fit. */
  kettleCapacityLitres: number | null;
}

/** Largest kettle the settings accept, L (both the API and the form read it). */
export const KETTLE_CAPACITY_MAX_LITRES = 2000;

/** Sensible settings for a small electric kettle, used until the co-op sets its own (common practice). */
export const DEFAULT_BREWHOUSE_SETTINGS: BrewhouseSettings = {
  boilOffLitresPerHour: 4,
  grainAbsorptionLitresPerKg: 1,
  kettleLossLitres: 1.5,
  fermenterLossLitres: 1,
  mashThicknessLitresPerKg: 3,
  grainTemperatureC: 18,
  mashTunHeatCapacityKjPerK: null,
  kettleCapacityLitres: null,
};
