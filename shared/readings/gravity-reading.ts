/** How a gravity reading was taken. */
export const INSTRUMENTS = ['hydrometer', 'refractometer', 'density-meter', 'logger'] as const;
export type Instrument = (typeof INSTRUMENTS)[number];

/** The unit a raw value was read in. */
export const GRAVITY_UNITS = ['sg', 'plato', 'brix', 'kg-m3'] as const;
export type GravityUnit = (typeof GRAVITY_UNITS)[number];

/** Where a reading came from: typed in, imported from a file, pushed by a logger. */
export const READING_SOURCES = ['hand', 'file', 'push'] as const;
export type ReadingSource = (typeof READING_SOURCES)[number];

/** Units each instrument reads in. */
export const INSTRUMENT_UNITS: Record<Instrument, readonly GravityUnit[]> = {
  hydrometer: ['sg', 'plato'],
  refractometer: ['brix'],
  'density-meter': ['kg-m3', 'sg', 'plato'],
  logger: ['sg', 'plato'],
};

export const INSTRUMENT_LABELS: Record<Instrument, string> = {
  hydrometer: 'Hydrometer',
  refractometer: 'Refractometer',
  'density-meter': 'Digital density meter',
  logger: 'Logger',
};

export const UNIT_LABELS: Record<GravityUnit, string> = { sg: 'SG', plato: '°P', brix: '°Bx', 'kg-m3': 'kg/m³' };

/** What a person (or a file row) enters for one reading. */
export interface ReadingInput {
  /** ISO instant. */
  measuredAt: string;
  instrument: Instrument;
  rawValue: number;
  rawUnit: GravityUnit;
  sampleTemperatureC: number | null;
  /** Hydrometers only: the temperature the instrument is calibrated at (20 °C when left out). */
  calibrationTemperatureC: number | null;
  note?: string;
}

/** A stored reading: the raw value as read, and the gravity corrected to SG 20/20 °C beside it. */
export interface GravityReading extends ReadingInput {
  id: number;
  batchId: number;
  correctedSg: number;
  /** Refractometer readings: the wort correction factor applied. */
  correctionFactor: number | null;
  /** Refractometer readings during fermentation: the original °Bx the alcohol correction used. */
  originalBrix: number | null;
  source: ReadingSource;
  /** File name for imported readings, token label for pushed ones. */
  sourceDetail: string | null;
  note: string;
  createdByName: string | null;
  updatedAt: string;
}
