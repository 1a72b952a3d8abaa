import { describe, expect, it } from 'vitest';
import { runCli } from '../../../server/cli/main.ts';
import { captureCliOutput } from '../../support/cliOutput.ts';

const PERCENT_TOLERANCE = 0.2;

const captured = captureCliOutput();

async function json(args: string[]): Promise<Record<string, unknown>> {
  const code = await runCli([...args, '--json']);
  expect(code).toBe(0);
  return JSON.parse(captured.stdout) as Record<string, unknown>;
}

describe('casewright emc', () => {
  it('prints emcPercent as JSON, matching WH2010 Table 4-2 at 70 °F and 50 % RH (9.2 %, secondary)', async () => {
    const out = await json(['emc', '--temp', '70F', '--rh', '50']);
    expect(Math.abs((out.emcPercent as number) - 9.2)).toBeLessThanOrEqual(PERCENT_TOLERANCE);
    expect(out.relativeHumidityPercent).toBe(50);
    expect(out.temperatureUnit).toBe('F');
  });

  it('accepts °C and reports both scales', async () => {
    const out = await json(['emc', '--temp', '21C', '--rh', '50']);
    expect(out.temperatureC).toBe(21);
    expect(out.temperatureF).toBe(69.8);
  });

  it('prints a sentence for a person without --json', async () => {
    expect(await runCli(['emc', '--temp', '70F', '--rh', '50'])).toBe(0);
    expect(captured.stdout).toContain('Equilibrium moisture content at 70 °F (21.1 °C) and 50 % RH: 9.2 %');
  });

  it('solves for the humidity when given --mc', async () => {
    const out = await json(['emc', '--temp', '70F', '--mc', '9.2']);
    expect(out.solvedFor).toBe('relativeHumidityPercent');
    expect(Math.abs((out.relativeHumidityPercent as number) - 50)).toBeLessThan(1.5);
  });

  it('refuses a temperature without its unit, exit code 2', async () => {
    expect(await runCli(['emc', '--temp', '70', '--rh', '50'])).toBe(2);
    expect(captured.stderr).toMatch(/--temp: "70" has no unit/);
    expect(captured.stdout).toBe('');
  });
});

describe('casewright movement', () => {
  it('prints changeMm and changeIn for 15 in of flat-sawn white oak from 8 % to 12 % (WH2010 Table 13-5, hand computed 5.5626 mm)', async () => {
    const out = await json(['movement', '--species', 'white-oak', '--width', '15in', '--from-mc', '8', '--to-mc', '12', '--sawn', 'flat']);
    expect(out.changeMm).toBe(5.56);
    expect(out.changeIn).toBe(0.219);
    expect(out.widthMm).toBe(381);
    expect(out.method).toBe('linear');
  });

  it('takes the larger coefficient when the sawing is not given', async () => {
    const out = await json(['movement', '--species', 'white-oak', '--width', '15in', '--from-mc', '8', '--to-mc', '12']);
    expect(out.sawn).toBe('unknown');
    expect(out.coefficient).toBe(0.00365);
  });

  it('names the option and the valid species for an unknown species', async () => {
    expect(await runCli(['movement', '--species', 'teak', '--width', '15in', '--from-mc', '8', '--to-mc', '12'])).toBe(2);
    expect(captured.stderr).toMatch(/--species: unknown species "teak"; choose one of: .*white-oak/);
  });

  it('names the option for a zero denominator', async () => {
    expect(await runCli(['movement', '--species', 'white-oak', '--width', '3/0in', '--from-mc', '8', '--to-mc', '12'])).toBe(2);
    expect(captured.stderr).toMatch(/--width: .*zero denominator/);
  });
});

describe('casewright float', () => {
  const cherry = ['float', '--species', 'black-cherry', '--panel-width', '14in', '--groove-depth', '3/8in', '--build-mc', '7', '--low-mc', '5', '--high-mc', '11'];

  it('prints the gap each side in mm and inches and the check', async () => {
    const out = await json(cherry);
    expect(out.ok).toBe(true);
    expect(out.gapEachSideMm).toBeGreaterThan(0);
    expect(out.gapEachSideIn).toBeCloseTo((out.gapEachSideMm as number) / 25.4, 3);
    expect(out.withinPublishedRange).toBe(false);
    expect(out.approximate).toBe(true);
  });

  it('reports the shortfall and the fix for a panel too wide for its groove', async () => {
    const out = await json(['float', '--species', 'white-oak', '--panel-width', '24in', '--groove-depth', '3/8in', '--build-mc', '8', '--low-mc', '6', '--high-mc', '11']);
    expect(out.ok).toBe(false);
    expect(out.shortfallMm).toBeGreaterThan(0);
    expect(out.fix).toMatch(/plywood/);
  });

  it('names the low moisture-content option when it is above the high', async () => {
    expect(await runCli([...cherry.slice(0, 9), '--low-mc', '12', '--high-mc', '11'])).toBe(2);
    expect(captured.stderr).toMatch(/--low-mc: /);
  });

  it('prints lines for a person without --json', async () => {
    expect(await runCli(cherry)).toBe(0);
    expect(captured.stdout).toMatch(/Gap each side at build: 3\/32" \(2\.6 mm\)/);
    expect(captured.stdout).toMatch(/Check: ok/);
  });
});
