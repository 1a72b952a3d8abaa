import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../../server/cli/main.ts';
import { captureCliOutput } from '../../support/cliOutput.ts';

/** The fixtures folder, found from this file so the test runs from any working folder. */
const FIXTURES = resolve(dirname(fileURLToPath(import.meta.url)), '../../fixtures');
const MM_TOLERANCE = 1e-6;
const IN = 25.4;

const captured = captureCliOutput();

interface CutlistJson {
  piece: { kind: string };
  parts: { id: string; name: string; role: string; material: string; quantity: number; lengthMm: number; widthMm: number; thicknessMm: number; features: unknown[] }[];
  joints: unknown[];
  checks: { id: string; severity: string }[];
  bboxMm: [number, number, number];
  boardFeet: { total: number };
}

describe('casewright cutlist', () => {
  it('builds a chest from --set values in maker notation and prints the whole result as JSON in mm', async () => {
    const code = await runCli(['cutlist', 'chest', '--set', 'width=40in', '--set', 'depth=19in', '--set', 'height=23in', '--set', 'legSize=1 3/4"', '--set', 'lidOverhangSide=44.5mm', '--json']);
    expect(code).toBe(0);
    const out = JSON.parse(captured.stdout) as CutlistJson;
    expect(out.piece.kind).toBe('chest');
    expect(Math.abs(out.bboxMm[0] - (40 * IN + 2 * 44.5))).toBeLessThan(MM_TOLERANCE);
    expect(Math.abs(out.bboxMm[2] - 23 * IN)).toBeLessThan(MM_TOLERANCE);
    const leg = out.parts.find((p) => p.id === 'leg');
    expect(leg?.quantity).toBe(4);
    expect(Math.abs((leg?.widthMm ?? 0) - 1.75 * IN)).toBeLessThan(MM_TOLERANCE);
    expect(leg?.material).toBe('White oak 8/4');
    expect(out.joints.length).toBeGreaterThan(0);
    expect(out.boardFeet.total).toBeGreaterThan(0);
    expect(captured.stderr).toBe('');
  });

  it('prints a cut list grouped by material with sizes in inches, then the checks', async () => {
    const code = await runCli(['cutlist', 'chest', '--set', 'width=40in', '--set', 'depth=19in', '--set', 'height=23in']);
    expect(code).toBe(0);
    expect(captured.stdout).toContain('White oak 4/4');
    // Front rail: 40 − 3-1/2 + 7/8 = 37-3/8 in (hand arithmetic).
    expect(captured.stdout).toMatch(/Front top rail\s+37 3\/8" × 3" × 3\/4"/);
    expect(captured.stdout).toContain('CHECKS');
    expect(captured.stdout).toContain('ASTM F963');
  });

  it('reads bare numbers in --set in the --units unit', async () => {
    const code = await runCli(['cutlist', 'chest', '--units', 'mm', '--set', 'width=1000', '--json']);
    expect(code).toBe(0);
    const out = JSON.parse(captured.stdout) as CutlistJson;
    expect(Math.abs(out.bboxMm[0] - (1000 + 2 * IN))).toBeLessThan(MM_TOLERANCE);
  });

  it('builds a spec file', async () => {
    const code = await runCli(['cutlist', resolve(FIXTURES, 'specs/chest-toy-maple.json'), '--json']);
    expect(code).toBe(0);
    const out = JSON.parse(captured.stdout) as CutlistJson;
    expect(Math.abs(out.bboxMm[2] - 457.2)).toBeLessThan(MM_TOLERANCE);
    expect(out.parts.some((p) => p.id.includes('stile'))).toBe(false);
  });

  it.each([
    [['--set', 'legSize=30in'], 'legSize'],
    [['--set', 'height=12in', '--set', 'topRailWidth=5in'], 'topRailWidth'],
    [['--set', 'legGrooveDepth=2in'], 'legGrooveDepth'],
    [['--set', 'width=40 furlongs'], 'width'],
    [['--set', 'nosuch=3'], 'nosuch'],
    [['--set', 'width'], '--set'],
  ])('refuses %j with exit code 2, naming %s, and prints nothing on captured.stdout', async (args, field) => {
    const code = await runCli(['cutlist', 'chest', ...args, '--json']);
    expect(code).toBe(2);
    expect(captured.stdout).toBe('');
    expect(captured.stderr).toContain(`${field}:`);
  });

  it('refuses a spec file with an impossible combination, naming the parameter and the limit', async () => {
    const code = await runCli(['cutlist', resolve(FIXTURES, 'specs/chest-invalid-legs.json')]);
    expect(code).toBe(2);
    expect(captured.stdout).toBe('');
    expect(captured.stderr).toMatch(/legSize: .*wider than half the width.*at most 137.3 mm/);
  });
});
