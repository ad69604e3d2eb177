import { csvOfCells, neutraliseCell } from './csv-cells';

// OWASP "CSV Injection": cells starting with = + - @ (or tab / carriage return) are read as formulas.
describe('CSV cells', () => {
  it.each(['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\tx', '\rx'])('neutraliseCell prefixes %p with an apostrophe', (cell) => {
    expect(neutraliseCell(cell)).toBe(`'${cell}`);
  });

  it('neutraliseCell leaves ordinary text alone', () => {
    expect(neutraliseCell('Ada Okafor')).toBe('Ada Okafor');
  });

  it('csvOfCells neutralises every cell, header included, and quotes as CSV does', () => {
    expect(csvOfCells([['Code', 'Note'], ['=F1', 'a, b']])).toBe("Code,Note\n'=F1,\"a, b\"\n");
  });
});
