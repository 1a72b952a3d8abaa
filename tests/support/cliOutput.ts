/**
 * Capture what the command line writes, for tests that call `runCli` in-process.
 * Call once at the top of a test file; read `out.stdout` / `out.stderr` after each run.
 */
import { afterEach, beforeEach, vi } from 'vitest';

export function captureCliOutput(): { stdout: string; stderr: string } {
  const out = { stdout: '', stderr: '' };
  beforeEach(() => {
    out.stdout = '';
    out.stderr = '';
    vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
      out.stdout += String(chunk);
      return true;
    });
    vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => {
      out.stderr += String(chunk);
      return true;
    });
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });
  return out;
}
