import { analyseDistillate, ethanolWaterDensity } from '../science';
import { analyseDistillateWithTable, massFractionFromTable } from './distillate-with-table';

// A table printed from the OIML R 22 equation itself at 20 °C, every 5 % mass.
const printed = { temperature: 20, rows: Array.from({ length: 21 }, (_, i) => ({ massPercent: 5 * i, density: ethanolWaterDensity(i / 20, 20) })) };

describe('massFractionFromTable', () => {
  it('agrees with the equation when the table is the equation printed', () => {
    expect(massFractionFromTable(printed, ethanolWaterDensity(0.0437, 20))).toBeCloseTo(0.0437, 8);
  });

  it('honours a table that reads 0.5 kg/m³ high at every row', () => {
    const high = { ...printed, rows: printed.rows.map((r) => ({ ...r, density: r.density + 0.5 })) };
    expect(massFractionFromTable(high, ethanolWaterDensity(0.0437, 20) + 0.5)).toBeCloseTo(0.0437, 6);
  });
});

describe('analyseDistillateWithTable', () => {
  it('gives the library\'s figure when the table is the equation printed', () => {
    // A 5 % vol beer: 100 mL made up to 100 mL reads about 991.1 kg/m³ at 20 °C (OIML R 22, from memory).
    const withTable = analyseDistillateWithTable(printed, 0.1, 0.1, 991.1, 20);
    expect(withTable.beerPercentVolume20).toBeCloseTo(analyseDistillate(0.1, 0.1, 991.1, 20).beerPercentVolume20, 6);
  });

  it('refuses a distillate read away from the table\'s temperature', () => {
    expect(() => analyseDistillateWithTable(printed, 0.1, 0.1, 991.1, 25)).toThrow(/table is at 20 °C/);
  });
});
