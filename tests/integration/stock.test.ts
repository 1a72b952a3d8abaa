import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { DEFAULT_STOCK_SETTINGS, type StockSettings } from '../../shared/materials/stockSettings.ts';
import { staleStockDetails, stockResponse } from '../../shared/schemas/stock.ts';
import { DEMO_STOCK } from '../../server/db/demoStock.ts';
import { DEMO_WORKSHOP, seedDemo } from '../../server/db/seed.ts';
import { anonymous, invitationTokens, signUp, startApi, type Api, type Client } from './support/api.ts';
import { makeShop, type Shop } from './support/world.ts';

const IN = 25.4;

let api: Api;
let shop: Shop;
let path: string;

beforeAll(async () => {
  api = await startApi();
  shop = await makeShop(api.app, 'stock', invitationTokens(api.mailbox));
  path = `/api/workshops/${shop.workshopId}/stock`;
});
afterAll(() => api.close());

// An invented rack: one white-oak board with a knot, one cherry board with a check.
const STOCK: StockSettings = {
  ...DEFAULT_STOCK_SETTINGS,
  sheetLengthMm: 2440,
  sheetWidthMm: 1220,
  offcuts: [{ sheetId: 'hardwood-plywood-3/4', lengthMm: 1200, widthMm: 600, count: 2 }],
  boardLengthsMm: [8 * 12 * IN, 10 * 12 * IN],
  boardsInStock: [
    { label: 'Rack 1', speciesId: 'white-oak', quarters: 4, lengthMm: 72 * IN, widthMm: 7 * IN, defects: [{ kind: 'knot', fromEndMm: 30 * IN, fromEdgeMm: 2 * IN, lengthMm: 1.5 * IN, widthMm: 1.5 * IN }] },
    { speciesId: 'black-cherry', quarters: 5, lengthMm: 60 * IN, widthMm: 9 * IN, defects: [{ kind: 'check', fromEndMm: 0, fromEdgeMm: 4 * IN, lengthMm: 6 * IN, widthMm: 0.25 * IN }] },
  ],
  kerfMm: 3,
  trimMm: 5,
};

/** Saves `stock` over whatever `client` reads now, as the Materials page does after loading it. */
async function save(client: Client, stock: unknown, at = path) {
  const { version } = stockResponse.parse((await client.get(at)).body);
  return client.put(at, { version, stock });
}

describe('workshop stock', () => {
  it('is the usual stock for a workshop that never saved any, and members may read it', async () => {
    const fresh = await signUp(api.app, 'stock-fresh');
    const workshopId = (await fresh.post('/api/workshops', { name: 'Fresh shop' })).body.id;
    const res = await fresh.get(`/api/workshops/${workshopId}/stock`);
    expect(res.status).toBe(200);
    expect(stockResponse.parse(res.body)).toEqual({ stock: DEFAULT_STOCK_SETTINGS, updatedAt: null, updatedBy: null, version: null });
  });

  it('is replaced whole by the owner or a designer and read back by every member', async () => {
    const saved = await save(shop.owner, STOCK);
    expect(saved.status).toBe(200);
    expect(saved.body.stock).toEqual(STOCK);
    expect(saved.body.updatedBy).toBe(shop.owner.user!.name);
    const byDesigner = { ...STOCK, kerfMm: 2.5 };
    const again = await save(shop.designer, byDesigner);
    expect(again.status).toBe(200);
    expect(again.body.updatedBy).toBe(shop.designer.user!.name);
    for (const member of [shop.owner, shop.designer, shop.reviewer]) {
      const read = await member.get(path);
      expect(read.status).toBe(200);
      expect(stockResponse.parse(read.body).stock).toEqual(byDesigner);
    }
  });

  it('is read-only for reviewers: a write answers 403 and changes nothing', async () => {
    await save(shop.owner, STOCK);
    const put = await save(shop.reviewer, { ...STOCK, boardsInStock: [] });
    expect(put.status).toBe(403);
    expect(put.body.error.code).toBe('forbidden');
    expect((await shop.owner.get(path)).body.stock).toEqual(STOCK);
  });

  it('is hidden from outsiders (404) and from anyone not signed in (401)', async () => {
    const outsider = await signUp(api.app, 'stock-outsider');
    expect((await outsider.get(path)).status).toBe(404);
    expect((await outsider.put(path, { version: null, stock: STOCK })).status).toBe(404);
    expect((await (await anonymous(api.app)).get(path)).status).toBe(401);
  });

  it('refuses a knot past the end of its board, naming the board, the defect and the field, and keeps what was saved', async () => {
    await save(shop.owner, STOCK);
    const board = STOCK.boardsInStock[0]!;
    const bad = { ...STOCK, boardsInStock: [STOCK.boardsInStock[1], { ...board, defects: [{ ...board.defects[0]!, fromEndMm: 71 * IN, lengthMm: 2 * IN }] }] };
    const res = await save(shop.owner, bad);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.details[0].path).toBe('stock.boardsInStock.1.defects.0.lengthMm');
    expect(res.body.error.message).toMatch(/^stock\.boardsInStock\.1\.defects\.0\.lengthMm: runs knot 1 past the far end of the board/);
    expect((await shop.owner.get(path)).body.stock).toEqual(STOCK);
  });

  it('refuses sizes beyond their limits, an unknown species and unknown fields, naming each field', async () => {
    const cases: [unknown, string, RegExp][] = [
      [{ ...STOCK, kerfMm: 40 }, 'kerfMm', /at most 20 mm/],
      [{ ...STOCK, sheetWidthMm: -1 }, 'sheetWidthMm', /more than 0 mm/],
      [{ ...STOCK, boardWidthsMm: [] }, 'boardWidthsMm', /at least one size/],
      [{ ...STOCK, boardsInStock: [{ ...STOCK.boardsInStock[0]!, speciesId: 'balsa-ish' }] }, 'boardsInStock.0.speciesId', /species/],
      [{ ...STOCK, boardsInStock: [{ ...STOCK.boardsInStock[0]!, label: 'x'.repeat(61) }] }, 'boardsInStock.0.label', /at most 60 characters/],
      [{ ...STOCK, boardsInStock: [{ ...STOCK.boardsInStock[0]!, label: 'nul\u0000' }] }, 'boardsInStock.0.label', /NUL/],
      [{ ...STOCK, offcuts: [{ ...STOCK.offcuts[0]!, count: 0 }] }, 'offcuts.0.count', /at least 1/],
      [{ ...STOCK, effort: 'thorough' }, '', /effort/],
    ];
    for (const [body, field, message] of cases) {
      const res = await save(shop.designer, body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.details[0].path, field).toBe(field === '' ? 'stock' : `stock.${field}`);
      expect(res.body.error.message, field).toMatch(message);
    }
    expect((await shop.owner.get(path)).body.stock).toEqual(STOCK);
  });
});

describe('workshop stock text and types', () => {
  it('keeps a label of SQL or markup as plain text and returns it verbatim', async () => {
    const label = "Robert'); DROP TABLE workshop_stock; --<b>";
    const board = { ...STOCK.boardsInStock[0]!, label: label.slice(0, 60) };
    const res = await save(shop.designer, { ...STOCK, boardsInStock: [board] });
    expect(res.status).toBe(200);
    expect((await shop.reviewer.get(path)).body.stock.boardsInStock[0].label).toBe(label.slice(0, 60));
    await save(shop.owner, STOCK);
  });

  it('names a length sent as text instead of millimetres (400)', async () => {
    const res = await save(shop.owner, { ...STOCK, kerfMm: '1/8"' });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0]).toEqual({ path: 'stock.kerfMm', message: 'must be a number (millimetres)' });
  });
});

describe('saving the stock from a version', () => {
  it('lets one of two saves from the same version land and answers the other 409 with the stock as it now is, saving nothing of it', async () => {
    await save(shop.owner, STOCK);
    const { version } = stockResponse.parse((await shop.owner.get(path)).body);
    const ownerStock = { ...STOCK, kerfMm: 2 };
    const designerStock = { ...STOCK, trimMm: 8 };
    const [byOwner, byDesigner] = await Promise.all([
      shop.owner.put(path, { version, stock: ownerStock }),
      shop.designer.put(path, { version, stock: designerStock }),
    ]);
    expect([byOwner.status, byDesigner.status].sort()).toEqual([200, 409]);
    const [won, lost, winner, wonStock] = byOwner.status === 200 ? [byOwner, byDesigner, shop.owner, ownerStock] : [byDesigner, byOwner, shop.designer, designerStock];
    expect(lost.body.error.code).toBe('stale_stock');
    expect(lost.body.error.message).toContain(`${winner.user!.name} saved the stock at`);
    const current = staleStockDetails.parse(lost.body.error.details).current;
    expect(current).toEqual(stockResponse.parse(won.body));
    expect(current.version).not.toBe(version);
    expect(stockResponse.parse((await shop.reviewer.get(path)).body)).toEqual(current);
    expect(current.stock).toEqual(wonStock);
  });

  it('keeps the losing draft for a save over the winner: sent again with the version the 409 named, it lands', async () => {
    const { version } = stockResponse.parse((await shop.owner.get(path)).body);
    expect((await shop.owner.put(path, { version, stock: { ...STOCK, kerfMm: 2.5 } })).status).toBe(200);
    const mine = { ...STOCK, kerfMm: 3.5 };
    const refused = await shop.designer.put(path, { version, stock: mine });
    expect(refused.status).toBe(409);
    const again = await shop.designer.put(path, { version: staleStockDetails.parse(refused.body.error.details).current.version, stock: mine });
    expect(again.status).toBe(200);
    expect(stockResponse.parse((await shop.owner.get(path)).body)).toMatchObject({ stock: mine, updatedBy: shop.designer.user!.name });
  });

  it('moves the version on every save, so a version read before the last save is refused', async () => {
    const first = stockResponse.parse((await save(shop.owner, STOCK)).body);
    const second = stockResponse.parse((await shop.owner.put(path, { version: first.version, stock: STOCK })).body);
    expect(second.version).not.toBe(first.version);
    expect((await shop.designer.put(path, { version: first.version, stock: STOCK })).status).toBe(409);
  });

  it('takes a first save from version null, and of two first saves at once keeps one', async () => {
    const fresh = await signUp(api.app, 'stock-first');
    const at = `/api/workshops/${(await fresh.post('/api/workshops', { name: 'First-save shop' })).body.id}/stock`;
    const [a, b] = await Promise.all([fresh.put(at, { version: null, stock: STOCK }), fresh.put(at, { version: null, stock: { ...STOCK, kerfMm: 2 } })]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const won = stockResponse.parse((a.status === 200 ? a : b).body);
    expect(won.version).toEqual(expect.any(String));
    expect(stockResponse.parse((await fresh.get(at)).body)).toEqual(won);
    expect((await fresh.put(at, { version: null, stock: STOCK })).status).toBe(409);
  });

  it('refuses a save with no version, a number, or text that is not a version read from the API (400 naming version), and keeps what was saved', async () => {
    const before = stockResponse.parse((await save(shop.owner, STOCK)).body);
    const cases: [unknown, RegExp][] = [
      [{ stock: STOCK }, /version: must be the version the stock was read at/],
      [{ version: 7, stock: STOCK }, /version: must be the version the stock was read at/],
      [{ version: 'yesterday', stock: STOCK }, /version: must be the version the stock was read at, unchanged/],
      [{ version: before.updatedAt, stock: STOCK }, /version: must be the version the stock was read at, unchanged/],
    ];
    for (const [body, message] of cases) {
      const res = await shop.owner.put(path, body);
      expect(res.status, JSON.stringify(body).slice(0, 40)).toBe(400);
      expect(res.body.error.details[0].path).toBe('version');
      expect(res.body.error.message).toMatch(message);
    }
    expect(stockResponse.parse((await shop.owner.get(path)).body)).toEqual(before);
  });
});

describe('the demo stock', () => {
  it('is seeded for the demo workshop once, and a second seed keeps a member\'s edits', async () => {
    await seedDemo(api.sequelize);
    const workshop = await api.sequelize.query<{ id: string }>('SELECT id FROM workshops WHERE name = :name', { type: QueryTypes.SELECT, replacements: { name: DEMO_WORKSHOP }, plain: true });
    const read = async () => (await api.sequelize.query<{ stock: StockSettings }>('SELECT stock FROM workshop_stock WHERE workshop_id = :id', { type: QueryTypes.SELECT, replacements: { id: workshop!.id }, plain: true }))!.stock;
    expect(await read()).toEqual(DEMO_STOCK);
    expect(DEMO_STOCK.boardsInStock.some((b) => b.speciesId === 'white-oak' && b.defects.some((d) => d.kind === 'knot'))).toBe(true);
    await api.sequelize.query(`UPDATE workshop_stock SET stock = jsonb_set(stock, '{kerfMm}', '2') WHERE workshop_id = :id`, { replacements: { id: workshop!.id } });
    await seedDemo(api.sequelize);
    expect((await read()).kerfMm).toBe(2);
    await api.sequelize.query('UPDATE workshop_stock SET stock = :stock::jsonb WHERE workshop_id = :id', { replacements: { id: workshop!.id, stock: JSON.stringify(DEMO_STOCK) } });
  });
});
