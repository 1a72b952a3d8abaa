import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { formatLength } from '../../../shared/units/index.ts';
import { newDoor, newObstacle, newRoom, newWindow } from '../../../src/editor/roomDefaults.ts';
import { roomFieldProblem } from '../../../src/editor/roomFieldProblem.ts';
import { readRoom, roomFitOutcome } from '../../../src/editor/roomFitOutcome.ts';
import { pathText, valueAt, withValueAt } from '../../../src/editor/roomPath.ts';
import { lengthsInUserUnits } from '../../../src/editor/roomText.ts';
import { useEditorStore } from '../../../src/state/useEditorStore.ts';

// 1 in = 25.4 mm exactly (international inch, 1959).
const inches = (mm: number) => formatLength(mm, { unit: 'in', precision: 16 });
const bedroom = () => JSON.parse(readFileSync('tests/fixtures/rooms/coastal-bedroom.json', 'utf8')) as Record<string, unknown>;

describe('withValueAt', () => {
  it('writes a nested value into a copy and leaves the original and its other branches alone', () => {
    const room = bedroom();
    const next = withValueAt(room, ['windows', 0, 'sillHeight'], 700) as Record<string, unknown>;
    expect(valueAt(next, ['windows', 0, 'sillHeight'])).toBe(700);
    expect(valueAt(room, ['windows', 0, 'sillHeight'])).toBe(760);
    expect(next['doors']).toBe(room['doors']);
  });

  it('removes a key written as undefined', () => {
    const next = withValueAt(bedroom(), ['placement', 'near'], undefined);
    expect(valueAt(next, ['placement'])).not.toHaveProperty('near');
  });
});

describe('pathText', () => {
  it('names a field the way the room parser does', () => {
    expect(pathText(['doors', 0, 'width'])).toBe('doors[0].width');
    expect(pathText(['placement', 'gap'])).toBe('placement.gap');
  });
});

describe('roomFieldProblem', () => {
  it('refuses a window that would run past the end of its wall, at the window width', () => {
    // The back wall is 3600 mm; the window starts at 1200 mm, so 2500 mm reaches 3700 mm.
    const candidate = withValueAt(bedroom(), ['windows', 0, 'width'], 2500);
    expect(roomFieldProblem(candidate, ['windows', 0, 'width'])).toMatch(/3700 mm, past the end of the back wall \(3600 mm\)/);
  });

  it('refuses a room narrower than the schema allows, and an empty door name', () => {
    expect(roomFieldProblem(withValueAt(bedroom(), ['width'], 250), ['width'])).toMatch(/at least 300 mm/);
    expect(roomFieldProblem(withValueAt(bedroom(), ['doors', 0, 'id'], ''), ['doors', 0, 'id'])).not.toBeNull();
  });

  it('does not hold a field back for a problem at another field', () => {
    const broken = withValueAt(bedroom(), ['windows', 0, 'width'], 2500);
    expect(roomFieldProblem(withValueAt(broken, ['ceiling'], 2500), ['ceiling'])).toBeNull();
  });
});

describe('lengthsInUserUnits', () => {
  it('rewrites every millimetre length of a message in inches, and the typed value of a limit', () => {
    expect(lengthsInUserUnits('Stand the piece 25.4 mm further from the wall (50.8 mm off it).', inches)).toBe('Stand the piece 1" further from the wall (2" off it).');
    expect(lengthsInUserUnits('must be at least 304.8 mm (got 254)', inches)).toBe('must be at least 12" (got 10")');
  });

  it('leaves degrees and words alone', () => {
    expect(lengthsInUserUnits('The lid meets the sill at 82° of its 90° opening.', inches)).toBe('The lid meets the sill at 82° of its 90° opening.');
  });
});

describe('newRoom', () => {
  it('starts a room that the room parser accepts, and rows with ids of their own', () => {
    const room = newRoom();
    const doors = [newDoor([]), newDoor([{ id: 'door-1' }])];
    const rows = [...doors, newWindow(doors, 'back'), newObstacle(doors)];
    expect(new Set(rows.map((r) => r.id)).size).toBe(rows.length);
    expect(readRoom({ ...room, doors, windows: [rows[2]], obstacles: [rows[3]] }).ok).toBe(true);
  });
});

describe('roomFitOutcome', () => {
  const result = buildPiece(defaultSpec('chest'));

  it('is none without a room, and names the bad field of a bad one', () => {
    expect(roomFitOutcome(undefined, result).kind).toBe('none');
    const outcome = roomFitOutcome(withValueAt(bedroom(), ['doors', 0, 'height'], 3000), result);
    expect(outcome).toMatchObject({ kind: 'invalid', field: 'room.doors[0].height' });
  });

  it('fits the piece to a good room once per room and result', () => {
    const room = bedroom();
    const first = roomFitOutcome(room, result);
    expect(first.kind).toBe('fit');
    expect(roomFitOutcome(room, result)).toBe(first);
    if (first.kind === 'fit') expect(first.fit.checks.map((c) => c.id)).toContain('lid-open');
  });
});

describe('useEditorStore.setRoom', () => {
  it('merges keystrokes in one room field into one undo step, and undo brings the room back', () => {
    const store = useEditorStore.getState();
    const spec = defaultSpec('chest');
    store.load('d', 1, spec);
    const room = bedroom();
    store.setRoom(room);
    store.setRoom(withValueAt(room, ['width'], 3), 'width');
    store.setRoom(withValueAt(room, ['width'], 3500), 'width');
    expect(valueAt(useEditorStore.getState().history!.present.room, ['width'])).toBe(3500);
    useEditorStore.getState().undo();
    expect(useEditorStore.getState().history!.present.room).toBe(room);
    useEditorStore.getState().undo();
    expect(useEditorStore.getState().history!.present).not.toHaveProperty('room');
  });
});
