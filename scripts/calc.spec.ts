import { execFileSync, spawnSync } from 'node:child_process';
import { runCalc } from './calc';

describe('runCalc', () => {
  it('lists every catalogued function with its parameters and units when given --list', () => {
    const { exitCode, output } = runCalc(['--list']);
    const list = JSON.parse(output) as { name: string; parameters: { name: string; unit: string }[] }[];
    expect(exitCode).toBe(0);
    expect(list.map((f) => f.name)).toEqual(expect.arrayContaining(['platoFromSg', 'ethanolWaterDensity', 'strengthBreakdown']));
    expect(list.find((f) => f.name === 'ethanolWaterDensity')?.parameters).toEqual([
      expect.objectContaining({ name: 'massFraction' }), expect.objectContaining({ name: 'temperature', unit: '°C' }),
    ]);
  });

  // OIML R 22 (1975): pure water at 20 °C is 998.20 kg/m³ (from memory).
  it('evaluates one function and prints its result as one JSON line', () => {
    const { exitCode, output } = runCalc(['ethanolWaterDensity', '--massFraction', '0', '--temperature', '20']);
    expect(exitCode).toBe(0);
    expect(output).not.toContain('\n');
    expect(JSON.parse(output).result).toBeCloseTo(998.2, 2);
  });

  it('accepts --name=value and negative numbers', () => {
    const { exitCode, output } = runCalc(['sgFromPlato', '--plato=-1']);
    expect(exitCode).toBe(0);
    expect(JSON.parse(output).result).toBeLessThan(1);
  });

  it('reports an out-of-range value as JSON naming the value and range, with exit code 1', () => {
    const { exitCode, output } = runCalc(['sgFromPlato', '--plato', '50']);
    expect(exitCode).toBe(1);
    expect(JSON.parse(output).error).toMatchObject({ code: 'out-of-range', parameter: 'plato', value: 50, min: -3, max: 40 });
  });

  it('reports FG above OG as an error', () => {
    const { exitCode, output } = runCalc(['strengthBreakdown', '--og', '1.040', '--fg', '1.050']);
    expect(exitCode).toBe(1);
    expect(JSON.parse(output).error.message).toMatch(/fg = 1.05 SG must not be above og = 1.04 SG/);
  });

  it('rejects an unknown function, an unknown parameter and a non-numeric value', () => {
    expect(runCalc(['noSuchThing']).exitCode).toBe(1);
    expect(JSON.parse(runCalc(['platoFromSg', '--sg', '1.05', '--colour', '3']).output).error.message).toMatch(/--colour/);
    expect(JSON.parse(runCalc(['platoFromSg', '--sg', 'heavy']).output).error.message).toMatch(/sg is required and must be a number/);
  });

  // Hand-worked Tinseth example (see shared/science/recipe/bitterness.spec.ts): two 28 g, 6 %, 60 min additions
  // in 20 L at 1.050 give 2 × 19.38 IBU.
  it('takes an array parameter as JSON', () => {
    const additions = JSON.stringify([{ grams: 28, alphaPercent: 6, minutes: 60 }, { grams: 28, alphaPercent: 6, minutes: 60 }]);
    const { exitCode, output } = runCalc(['totalTinsethIbu', '--additions', additions, '--boilGravity', '1.05', '--litres', '20']);
    expect(exitCode).toBe(0);
    expect(JSON.parse(output).result).toBeCloseTo(38.75, 1);
  });

  it('takes a text choice', () => {
    const { exitCode, output } = runCalc(['primingSugar', '--litres', '20', '--targetVolumes', '2.5', '--highestTemperature', '20', '--sugar', 'dextrose-monohydrate']);
    expect(exitCode).toBe(0);
    expect(JSON.parse(output).result.grams).toBeGreaterThan(0);
  });

  it('reports a missing parameter by name', () => {
    expect(JSON.parse(runCalc(['platoFromSg']).output).error.message).toMatch(/sg is required/);
  });
});

describe('calc command line', () => {
  const tsx = require.resolve('tsx/cli');

  it('prints a result line and exits 0 when run as a script', () => {
    const out = execFileSync(process.execPath, [tsx, 'scripts/calc.ts', 'platoFromSg', '--sg', '1.040'], { encoding: 'utf8' });
    expect(JSON.parse(out).name).toBe('platoFromSg');
  }, 30000);

  it('exits non-zero with a JSON error when run as a script with a bad value', () => {
    const run = spawnSync(process.execPath, [tsx, 'scripts/calc.ts', 'waterDensity', '--temperature', '90'], { encoding: 'utf8' });
    expect(run.status).toBe(1);
    expect(JSON.parse(run.stdout).error.parameter).toBe('temperature');
  }, 30000);
});
