/**
 * The demo: Tidewater Joinery, an invented small shop on the coast, with three invented people
 * (server/db/demo-accounts.json, the sign-ins `npm start` prints) and a few designs with
 * revisions, a fork, comments, an approval, a price list and stock on hand. Nothing here is a real business,
 * person or price.
 *
 * Idempotent: people, the workshop, memberships and each design are created only when missing,
 * so running it again changes nothing — except to add a piece kind the engine has learned since.
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Sequelize } from 'sequelize';
import { defaultSpec } from '../../shared/engine/index.ts';
import type { PieceKind, PieceSpec } from '../../shared/engine/types.ts';
import { isInputError } from '../../shared/errors.ts';
import type { Role } from '../../shared/permissions.ts';
import { hashPassword } from '../auth/password.ts';
import { createCommentService } from '../features/comments/comments.service.ts';
import { createDesignService } from '../features/designs/designs.service.ts';
import { seedDemoPriceList } from './demoPriceList.ts';
import { seedDemoRoom } from './demoRoom.ts';
import { seedDemoStock } from './demoStock.ts';
import { modelsFor } from './models/index.ts';

export const DEMO_WORKSHOP = 'Tidewater Joinery';

type DemoAccounts = { password: string; accounts: { role: Role; email: string; name: string }[] };

const IN = 25.4;

function demoAccounts(): DemoAccounts {
  const file = join(dirname(fileURLToPath(import.meta.url)), 'demo-accounts.json');
  return JSON.parse(readFileSync(file, 'utf8')) as DemoAccounts;
}

/** The kind's default spec with `changes` applied to the parameters it has. */
function specFor(kind: PieceKind, changes: Record<string, unknown>): PieceSpec {
  const spec = defaultSpec(kind);
  const params = { ...spec.params };
  for (const [key, value] of Object.entries(changes)) if (key in params) params[key] = value;
  return { ...spec, params };
}

/** Returns true when it created anything. */
export async function seedDemo(sequelize: Sequelize): Promise<boolean> {
  const models = modelsFor(sequelize);
  const designs = createDesignService(sequelize, models);
  const comments = createCommentService(sequelize, models);
  const demo = demoAccounts();
  let created = false;

  const people = {} as Record<Role, string>;
  for (const account of demo.accounts) {
    let user = await models.User.findOne({ where: { email: account.email } });
    if (!user) {
      user = await models.User.create({ email: account.email, name: account.name, passwordHash: await hashPassword(demo.password) });
      created = true;
    }
    people[account.role] = user.id;
  }

  let workshop = await models.Workshop.findOne({ where: { name: DEMO_WORKSHOP } });
  if (!workshop) {
    workshop = await models.Workshop.create({
      name: DEMO_WORKSHOP,
      settings: { demo: true, note: 'An invented small coastal furniture shop for the demo; its people, pieces and prices are made up.' },
    });
    created = true;
  }
  const workshopId = workshop.id;
  for (const account of demo.accounts) {
    const [, made] = await models.Membership.findOrCreate({
      where: { workshopId, userId: people[account.role] },
      defaults: { workshopId, userId: people[account.role], role: account.role },
    });
    created ||= made;
  }
  // Invented prices (see demoPriceList.ts), so the Materials page can cost the demo pieces.
  created = (await seedDemoPriceList(sequelize, workshopId, people.owner)) || created;
  // Invented boards on the rack and an offcut (see demoStock.ts), used before anything is bought.
  created = (await seedDemoStock(sequelize, workshopId, people.owner)) || created;

  const existing = async (title: string) => models.Design.findOne({ where: { workshopId, title } });

  // A white-oak blanket chest for a coastal bedroom, worked through several revisions.
  const chestTitle = 'Blanket chest, white oak';
  if (!(await existing(chestTitle))) {
    const first = specFor('chest', { species: 'white-oak', width: 40 * IN, depth: 19 * IN, height: 23 * IN });
    const chest = await designs.create(workshopId, people.designer, { title: chestTitle, spec: first, message: 'First layout at the size the client asked for' });
    const wider = specFor('chest', { species: 'white-oak', width: 42 * IN, depth: 19 * IN, height: 23 * IN });
    await designs.save(chest.id, people.designer, { baseRevision: 1, spec: wider, message: 'Two inches wider to sit under the window' });
    const overhang = specFor('chest', { species: 'white-oak', width: 42 * IN, depth: 19 * IN, height: 23 * IN, lidOverhangFront: 1.25 * IN, lidOverhangSide: 1.25 * IN });
    await designs.save(chest.id, people.owner, { baseRevision: 2, spec: overhang, message: 'Bigger lid overhang so it reads lighter' });
    const panels = specFor('chest', {
      species: 'white-oak', width: 42 * IN, depth: 19 * IN, height: 23 * IN, lidOverhangFront: 1.25 * IN, lidOverhangSide: 1.25 * IN, frontStileCount: 2,
    });
    await designs.save(chest.id, people.designer, { baseRevision: 3, spec: panels, message: 'Three panels across the front' });
    await comments.create(chest.id, people.reviewer, { body: 'Could the lid open a little gentler? Grandchildren will use this.', revision: 2, partId: 'lid' });
    await comments.create(chest.id, people.designer, { body: 'Lid-support hinges are already specified; they hold the lid at any angle.', revision: 2, partId: 'lid' });
    await comments.decide(chest.id, people.reviewer, { revision: 3, decision: 'approved', note: 'Approved at this size; the wood tone matches the bed.' });
    await comments.create(chest.id, people.reviewer, { body: 'Three panels look busy to me; happy with revision 3.', revision: 4 });

    // A variation started from revision 2: a smaller chest for a child's room.
    await designs.fork(chest.id, people.designer, { workshopId, revision: 2, title: 'Toy chest, white oak (from the blanket chest)' });
    created = true;
  }
  // The bedroom the chest is for, measured and saved as a revision of its own (demoRoom.ts).
  const measured = await existing(chestTitle);
  if (measured) created = (await seedDemoRoom(sequelize, measured.id, people.designer)) || created;

  // The other demo pieces need the engine to build their kind; skipped until it does.
  const others: { title: string; kind: PieceKind; changes: Record<string, unknown>; message: string }[] = [
    { title: 'Six-drawer dresser, cherry', kind: 'dresser', changes: { species: 'black-cherry', drawerRows: 3, drawerColumns: 2, finish: 'clear' }, message: 'Six drawers in cherry, first layout' },
    { title: 'Mudroom cabinet, painted maple', kind: 'cabinet', changes: { species: 'soft-maple', finish: 'paint' }, message: 'Painted maple cabinet for the mudroom, first layout' },
  ];
  for (const piece of others) {
    if (await existing(piece.title)) continue;
    try {
      await designs.create(workshopId, people.designer, { title: piece.title, spec: specFor(piece.kind, piece.changes), message: piece.message });
      created = true;
    } catch (error) {
      if (!isInputError(error)) throw error;
    }
  }
  return created;
}
