import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ROOM_MESSAGE, seedDemoRoom } from '../../server/db/demoRoom.ts';
import { DEMO_WORKSHOP, seedDemo } from '../../server/db/seed.ts';
import { modelsFor } from '../../server/db/models/index.ts';
import { buildPiece } from '../../shared/engine/index.ts';
import { validateSpec } from '../../shared/engine/params.ts';
import { envelopeFromResult } from '../../shared/room/pieceEnvelope.ts';
import { fitRoom } from '../../shared/room/fitRoom.ts';
import { parseRoomSection } from '../../shared/room/parseRoom.ts';
import { buildTestApp } from '../support/testApp.ts';

let app: ReturnType<typeof buildTestApp>;
beforeAll(async () => {
  app = buildTestApp();
  await seedDemo(app.sequelize);
});
afterAll(() => app.close());

async function demoChest() {
  const models = modelsFor(app.sequelize);
  const workshop = await models.Workshop.findOne({ where: { name: DEMO_WORKSHOP } });
  const chest = await models.Design.findOne({ where: { workshopId: workshop!.id, title: 'Blanket chest, white oak' } });
  const revisions = await models.Revision.findAll({ where: { designId: chest!.id }, order: [['number', 'ASC']] });
  return { chest: chest!, revisions };
}

describe('seedDemoRoom', () => {
  it('gives the demo chest its bedroom as a revision of its own, after the earlier ones', async () => {
    const { revisions } = await demoChest();
    const measured = revisions.filter((r) => r.message === DEMO_ROOM_MESSAGE);
    expect(measured).toHaveLength(1);
    const before = revisions.find((r) => r.number === measured[0]!.number - 1)!;
    expect(before.spec.room).toBeUndefined();
    expect(measured[0]!.spec.params).toEqual(before.spec.params);
  });

  it('stands the demo chest where every room-fit check passes, its open lid clear of the sill', async () => {
    const { revisions } = await demoChest();
    const spec = revisions.find((r) => r.message === DEMO_ROOM_MESSAGE)!.spec;
    const fit = fitRoom(parseRoomSection(spec.room), envelopeFromResult(buildPiece(validateSpec(spec))));
    expect(fit.checks.find((c) => c.id === 'lid-open')?.passed).toBe(true);
    expect(fit.checks.filter((c) => !c.passed).map((c) => c.id)).toEqual([]);
  });

  it('adds nothing when run again', async () => {
    const { chest, revisions } = await demoChest();
    expect(await seedDemoRoom(app.sequelize, chest.id, revisions[0]!.authorId!)).toBe(false);
    expect((await demoChest()).revisions).toHaveLength(revisions.length);
  });
});
