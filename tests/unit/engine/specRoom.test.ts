import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { defaultSpec, validateSpec } from '../../../shared/engine/index.ts';
import { InputError } from '../../../shared/errors.ts';

const room = JSON.parse(readFileSync('tests/fixtures/rooms/coastal-bedroom.json', 'utf8')) as Record<string, unknown>;

describe('validateSpec with a room section', () => {
  it('accepts a good room and keeps it as given', () => {
    const spec = validateSpec({ ...defaultSpec('chest'), room });
    expect(spec.room).toEqual(room);
  });

  it('refuses a bad room with an InputError naming the room field', () => {
    const bad = { ...room, width: -5 };
    expect(() => validateSpec({ ...defaultSpec('chest'), room: bad })).toThrow(InputError);
    try {
      validateSpec({ ...defaultSpec('chest'), room: bad });
    } catch (error) {
      expect((error as InputError).field).toBe('room.width');
    }
  });

  it('refuses a window that runs past the end of its wall', () => {
    const windows = [{ ...(room.windows as object[])[0], position: 3500 }];
    expect(() => validateSpec({ ...defaultSpec('chest'), room: { ...room, windows } })).toThrow(/room\.windows|wall/);
  });
});
