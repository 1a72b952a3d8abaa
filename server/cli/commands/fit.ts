/**
 * `casewright fit path/to/spec.json --room path/to/room.json [--fit-niche] [--pin width,height]
 * [--free-proportions] [--json]`: places the piece in the room and prints every room-fit check
 * (footprint, window sill, lid, doors and drawers open, walkway, passage through each door)
 * with its numbers and fix. `--fit-niche` also proposes the largest size that passes them all.
 * The room comes from `--room`, or from the spec's own `room` section. Lengths in mm.
 */
import { readFileSync } from 'node:fs';
import { buildPiece, PIECE_KINDS } from '../../../shared/engine/index.ts';
import { InputError } from '../../../shared/errors.ts';
import { envelopeFromResult } from '../../../shared/room/pieceEnvelope.ts';
import { fitRoom, type RoomFit } from '../../../shared/room/fitRoom.ts';
import { fitToNiche, SIZE_KEYS, type NicheFit, type SizeKey } from '../../../shared/room/fitToNiche.ts';
import { parseRoomSection } from '../../../shared/room/parseRoom.ts';
import type { RoomSection } from '../../../shared/room/roomSchema.ts';
import { printJson, printLines } from '../options.ts';
import { fromUserCwd } from '../paths.ts';
import { specFromArguments } from './cutlist.ts';
import type { RegisterCommand } from './index.ts';

interface FitOptions {
  room?: string;
  fitNiche?: boolean;
  pin?: string;
  freeProportions?: boolean;
  json?: boolean;
}

function readRoomFile(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(fromUserCwd(path), 'utf8');
  } catch {
    throw new InputError('--room', `cannot read "${path}"`, 'a readable JSON file');
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (error) {
    throw new InputError('--room', `"${path}" is not valid JSON (${error instanceof Error ? error.message : String(error)})`, 'JSON');
  }
}

function pinnedSizes(text: string | undefined): SizeKey[] {
  if (text === undefined || text.trim() === '') return [];
  return text.split(',').map((raw) => {
    const key = raw.trim();
    if (!(SIZE_KEYS as readonly string[]).includes(key)) throw new InputError('--pin', `"${key}" is not one of ${SIZE_KEYS.join(', ')}`, SIZE_KEYS.join(', '));
    return key as SizeKey;
  });
}

/** The printed report: placement, every check, assumptions, and the niche fit when asked. */
export function fitLines(fit: RoomFit, room: RoomSection, niche: NicheFit | null): string[] {
  const lines = [
    `Room: ${room.name ?? 'unnamed'} (${room.width} × ${room.depth} mm, ceiling ${room.ceiling} mm)`,
    `Placed against the ${room.placement.wall} wall, ${round(fit.placed.standoffMm)} mm off it${fit.placed.niche ? `, in a niche from ${round(fit.placed.niche.fromMm)} to ${round(fit.placed.niche.toMm)} mm along the wall` : ''}.`,
    '',
    'CHECKS',
  ];
  for (const c of fit.checks) {
    lines.push(`  [${c.passed ? 'pass' : c.severity}] ${c.title}: ${c.message}`);
    if (c.fix) lines.push(`    fix: ${c.fix}`);
  }
  if (fit.assumptions.length > 0) lines.push('', 'ASSUMED', ...fit.assumptions.map((a) => `  ${a}`));
  if (niche) {
    lines.push('', 'FIT TO NICHE', `  ${niche.message}`);
    for (const c of niche.changes) lines.push(`  ${c.key}: ${round(c.fromMm)} mm → ${c.toMm} mm`);
  }
  lines.push('', 'Room fit checks clearances as modelled; measure the room and the way in, and follow local codes.');
  return lines;
}

export const registerFit: RegisterCommand = (program) => {
  program
    .command('fit')
    .description('Place a piece in a room and check footprint, openings, walkway and passage through the door.')
    .argument('<piece>', `a spec file (JSON) or a piece kind (${PIECE_KINDS.join(', ')})`)
    .option('--room <file>', "a room file (JSON); default the spec's own room section")
    .option('--fit-niche', 'also propose the largest width, depth and height that pass every check')
    .option('--pin <sizes>', 'sizes fit to niche keeps, comma-separated: width, depth, height')
    .option('--free-proportions', 'let fit to niche grow each free size on its own after scaling')
    .option('--json', 'print the checks, placement, scene and niche fit as JSON, lengths in mm')
    .action((piece: string, opts: FitOptions) => {
      const spec = specFromArguments(piece, [], 'mm');
      const roomInput = opts.room !== undefined ? readRoomFile(opts.room) : spec.room;
      if (roomInput === undefined) throw new InputError('--room', 'is required when the spec has no room section', 'a room file');
      const room = parseRoomSection(roomInput);
      const fit = fitRoom(room, envelopeFromResult(buildPiece(spec)));
      const niche = opts.fitNiche ? fitToNiche(spec, room, buildPiece, { pinned: pinnedSizes(opts.pin), keepProportions: !opts.freeProportions }) : null;
      if (opts.json) {
        printJson({ passed: fit.passed, placement: fit.placed, checks: fit.checks, assumptions: fit.assumptions, scene: fit.scene, ...(niche ? { nicheFit: { found: niche.found, message: niche.message, changes: niche.changes, params: niche.params, checks: niche.fit.checks } } : {}) });
      } else {
        printLines(fitLines(fit, room, niche));
      }
    });
};

const round = (n: number): number => Math.round(n * 10) / 10;
