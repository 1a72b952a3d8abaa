import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildPiece } from '../../../shared/engine/index.ts';
import { validateSpec } from '../../../shared/engine/params.ts';
import type { PieceSpec } from '../../../shared/engine/types.ts';
import { envelopeFromResult } from '../../../shared/room/pieceEnvelope.ts';
import { fitRoom } from '../../../shared/room/fitRoom.ts';
import { parseRoomSection } from '../../../shared/room/parseRoom.ts';
import { answerNicheFit } from '../../../src/editor/nicheFit.ts';

const bedroom = () => JSON.parse(readFileSync('tests/fixtures/rooms/coastal-bedroom.json', 'utf8')) as Record<string, unknown>;
// The demo chest's sizes: 42 × 19 × 23 in (1 in = 25.4 mm).
const chest = (room: unknown): PieceSpec => ({ schemaVersion: 1, kind: 'chest', params: { width: 1066.8, depth: 482.6, height: 584.2 }, room });

describe('answerNicheFit', () => {
  it('proposes whole-millimetre sizes at which the chest passes every check in the bedroom', () => {
    const spec = chest(bedroom());
    const answer = answerNicheFit({ id: 7, spec, pinned: [], keepProportions: true });
    expect(answer).toMatchObject({ id: 7, ok: true, found: true });
    if (!answer.ok) return;
    const fitted = { ...spec, params: answer.params };
    for (const change of answer.changes) expect(Number.isInteger(change.toMm)).toBe(true);
    const fit = fitRoom(parseRoomSection(spec.room), envelopeFromResult(buildPiece(validateSpec(fitted))));
    expect(fit.checks.filter((c) => !c.passed && !c.needsInput)).toEqual([]);
  });

  it('keeps a pinned size as it is', () => {
    const answer = answerNicheFit({ id: 1, spec: chest(bedroom()), pinned: ['width'], keepProportions: true });
    expect(answer.ok && answer.params['width']).toBe(1066.8);
  });

  it('answers with the bad field of a bad room instead of throwing', () => {
    const answer = answerNicheFit({ id: 2, spec: chest({ ...bedroom(), ceiling: 100 }), pinned: [], keepProportions: true });
    expect(answer).toMatchObject({ id: 2, ok: false, field: 'room.ceiling' });
  });
});
