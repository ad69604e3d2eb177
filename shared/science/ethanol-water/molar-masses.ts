// Molar masses from IUPAC standard atomic weights (C 12.011, H 1.008, O 15.999), g/mol.
/** Molar mass of ethanol, C2H5OH, g/mol. */
export const ETHANOL_MOLAR_MASS = 46.069;
/** Molar mass of water, H2O, g/mol. */
export const WATER_MOLAR_MASS = 18.015;
