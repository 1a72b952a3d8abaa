import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../../server/cli/main.ts';
import { captureCliOutput } from '../../support/cliOutput.ts';

/** The fixtures folder, found from this file so the test runs from any working folder. */
const FIXTURES = resolve(dirname(fileURLToPath(import.meta.url)), '../../fixtures');
const ROOM = resolve(FIXTURES, 'rooms/coastal-bedroom.json');
const SPEC = resolve(FIXTURES, 'specs/chest-blanket-coastal.json');

const captured = captureCliOutput();

interface FitJson {
  passed: boolean;
  checks: { id: string; passed: boolean; severity: string; numbers: Record<string, number> }[];
  scene: { lid: { contactDeg: number | null } | null };
  nicheFit?: { found: boolean; params: Record<string, number>; checks: { passed: boolean }[] };
}

describe('casewright fit', () => {
  it('prints every check for the demo chest in the coastal bedroom, the lid failing at the sill', async () => {
    const code = await runCli(['fit', SPEC, '--room', ROOM]);
    expect(code).toBe(0);
    expect(captured.stdout).toContain('[pass] Footprint');
    expect(captured.stdout).toContain('[error] Lid open: The lid meets the window sill (sea)');
    expect(captured.stdout).toContain('[pass] Through door hall');
    expect(captured.stdout).toContain('[pass] Walkway in front');
  });

  it('proposes a size that passes every check with --fit-niche --json', async () => {
    const code = await runCli(['fit', SPEC, '--room', ROOM, '--fit-niche', '--json']);
    expect(code).toBe(0);
    const out = JSON.parse(captured.stdout) as FitJson;
    expect(out.passed).toBe(false);
    expect(out.checks.find((c) => c.id === 'lid-open')?.passed).toBe(false);
    expect(out.scene.lid?.contactDeg).toBeGreaterThan(0);
    expect(out.nicheFit?.found).toBe(true);
    expect(out.nicheFit?.checks.every((c) => c.passed)).toBe(true);
    expect(out.nicheFit!.params['height']!).toBeLessThan(584.2);
  });

  it('exits 2 naming the room field when the room file is wrong', async () => {
    const code = await runCli(['fit', 'chest', '--room', resolve(FIXTURES, 'rooms/does-not-exist.json')]);
    expect(code).toBe(2);
    expect(captured.stdout).toBe('');
    expect(captured.stderr).toContain('--room');
  });

  it('exits 2 when there is no room at all', async () => {
    const code = await runCli(['fit', 'chest']);
    expect(code).toBe(2);
    expect(captured.stderr).toContain('--room: is required');
  });

  it('refuses an unknown pinned size', async () => {
    const code = await runCli(['fit', 'chest', '--room', ROOM, '--fit-niche', '--pin', 'length']);
    expect(code).toBe(2);
    expect(captured.stderr).toContain('--pin');
  });
});
