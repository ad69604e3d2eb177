import { guessMapping, previewCsv, splitCsvLine } from './csv-preview';

describe('CSV preview', () => {
  it('when a field is quoted with a comma inside, then it stays one field', () => {
    expect(splitCsvLine('2026-11-21T08:00:00Z,"fresh, cold",1.050')).toEqual(['2026-11-21T08:00:00Z', 'fresh, cold', '1.050']);
  });

  it('when previewing, then the header and the first rows come back without blank lines', () => {
    expect(previewCsv('\uFEFFtime,value\n\n2026-11-21 08:00,1.05\r\n2026-11-21 09:00,1.049\n')).toEqual({
      header: ['time', 'value'],
      rows: [['2026-11-21 08:00', '1.05'], ['2026-11-21 09:00', '1.049']],
    });
  });

  it('when a logger file names its columns its own way, then the guess maps time, gravity and temperature', () => {
    expect(guessMapping(['Timestamp', 'SG', 'Temp C'])).toMatchObject({ time: 'Timestamp', value: 'SG', temperature: 'Temp C', instrument: null, unit: null });
  });
});
