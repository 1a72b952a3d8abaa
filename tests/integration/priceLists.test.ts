import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { priceListCsvErrors, priceListResponse } from '../../shared/schemas/priceLists.ts';
import { DEMO_PRICE_LIST } from '../../server/db/demoPriceList.ts';
import { DEMO_WORKSHOP, seedDemo } from '../../server/db/seed.ts';
import { anonymous, invitationTokens, signUp, startApi, type Api } from './support/api.ts';
import { makeShop, type Shop } from './support/world.ts';

let api: Api;
let shop: Shop;
let path: string;

beforeAll(async () => {
  api = await startApi();
  shop = await makeShop(api.app, 'prices', invitationTokens(api.mailbox));
  path = `/api/workshops/${shop.workshopId}/price-list`;
});
afterAll(() => api.close());

// Invented prices for the tests, not market prices.
const LIST = {
  currency: 'USD',
  items: [
    { kind: 'lumber', speciesId: 'white-oak', quarters: 4, pricePerBoardFootCents: 875 },
    { kind: 'sheet', sheetId: 'hardwood-plywood-3/4', pricePerSheetCents: 9400 },
    { kind: 'hardware', itemId: 'lid-stay', name: 'Lid support hinge', unit: 'pair', pricePerUnitCents: 4250 },
  ],
};

const GOOD_CSV = [
  'kind,item,thickness,price,unit,name',
  'lumber,white-oak,4/4,9.10,,',
  'lumber,white-oak,8/4,11.40,,',
  'sheet,hardwood-plywood-1/4,,48.00,,',
  'finish,oil-quart,,27.50,quart,Hardwax oil',
].join('\n');

describe('price list', () => {
  it('is empty in US dollars for a workshop that never saved one, and members may read it', async () => {
    const fresh = await signUp(api.app, 'prices-fresh');
    const workshopId = (await fresh.post('/api/workshops', { name: 'Fresh shop' })).body.id;
    const res = await fresh.get(`/api/workshops/${workshopId}/price-list`);
    expect(res.status).toBe(200);
    expect(priceListResponse.parse(res.body)).toEqual({ priceList: { currency: 'USD', items: [] }, updatedAt: null, updatedBy: null });
  });

  it('is replaced whole by the owner and read back by every member', async () => {
    const saved = await shop.owner.put(path, LIST);
    expect(saved.status).toBe(200);
    expect(saved.body.priceList).toEqual(LIST);
    expect(saved.body.updatedBy).toBe(shop.owner.user!.name);
    for (const member of [shop.designer, shop.reviewer]) {
      const read = await member.get(path);
      expect(read.status).toBe(200);
      expect(priceListResponse.parse(read.body).priceList).toEqual(LIST);
    }
  });

  it('is read-only for designers and reviewers: writes answer 403 and change nothing', async () => {
    await shop.owner.put(path, LIST);
    for (const member of [shop.designer, shop.reviewer]) {
      const put = await member.put(path, { currency: 'USD', items: [] });
      expect(put.status).toBe(403);
      expect(put.body.error.code).toBe('forbidden');
      const csv = await member.post(`${path}/csv`, GOOD_CSV);
      expect(csv.status).toBe(403);
    }
    expect((await shop.owner.get(path)).body.priceList).toEqual(LIST);
  });

  it('is hidden from outsiders (404) and from anyone not signed in (401)', async () => {
    const outsider = await signUp(api.app, 'prices-outsider');
    expect((await outsider.get(path)).status).toBe(404);
    expect((await (await anonymous(api.app)).get(path)).status).toBe(401);
  });

  it('refuses a list that prices the same thing twice or a negative price, naming the row', async () => {
    const twice = await shop.owner.put(path, { currency: 'USD', items: [LIST.items[0], { ...LIST.items[0], pricePerBoardFootCents: 900 }] });
    expect(twice.status).toBe(400);
    expect(twice.body.error.details[0].path).toBe('items.1');
    const negative = await shop.owner.put(path, { currency: 'USD', items: [{ ...LIST.items[1], pricePerSheetCents: -1 }] });
    expect(negative.status).toBe(400);
    expect(negative.body.error.details[0].path).toBe('items.0.pricePerSheetCents');
  });

  it('saves nothing from a CSV with one bad row, and names its line', async () => {
    await shop.owner.put(path, LIST);
    const bad = [GOOD_CSV.split('\n')[0], 'lumber,white-oak,4/4,9.10,,', 'lumber,white-oak,5/8,9.10,,', 'sheet,hardwood-plywood-1/4,,48.00,,'].join('\n');
    const res = await shop.owner.post(`${path}/csv`, bad);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_csv');
    const { errors } = priceListCsvErrors.parse(res.body.error.details);
    expect(errors).toEqual([{ line: 3, column: 'thickness', message: expect.stringContaining('5/8') }]);
    expect((await shop.owner.get(path)).body.priceList).toEqual(LIST);
  });

  it('replaces the whole list from a good CSV, keeping the list currency', async () => {
    await shop.owner.put(path, { ...LIST, currency: 'CAD' });
    const res = await shop.owner.post(`${path}/csv`, GOOD_CSV);
    expect(res.status).toBe(200);
    const { priceList } = priceListResponse.parse(res.body);
    expect(priceList.currency).toBe('CAD');
    expect(priceList.items).toEqual([
      { kind: 'lumber', speciesId: 'white-oak', quarters: 4, pricePerBoardFootCents: 910 },
      { kind: 'lumber', speciesId: 'white-oak', quarters: 8, pricePerBoardFootCents: 1140 },
      { kind: 'sheet', sheetId: 'hardwood-plywood-1/4', pricePerSheetCents: 4800 },
      { kind: 'finish', itemId: 'oil-quart', name: 'Hardwax oil', unit: 'quart', pricePerUnitCents: 2750 },
    ]);
    expect((await shop.designer.get(path)).body.priceList).toEqual(priceList);
  });

  it('takes the currency of an upload from ?currency= and refuses one that is not a code', async () => {
    const res = await shop.owner.post(`${path}/csv?currency=EUR`, GOOD_CSV);
    expect(res.body.priceList.currency).toBe('EUR');
    expect((await shop.owner.post(`${path}/csv?currency=euros`, GOOD_CSV)).status).toBe(400);
  });

  it('refuses an upload that is not CSV text (415) and a NUL character by its line', async () => {
    const json = await shop.owner.post(`${path}/csv`, { csv: GOOD_CSV });
    expect(json.status).toBe(415);
    const nul = await shop.owner.post(`${path}/csv`, `${GOOD_CSV}\nhardware,hinge,,3.00,each,Bad\u0000name`);
    expect(nul.status).toBe(400);
    expect(nul.body.error.details.errors[0].line).toBe(6);
  });
});

describe('the demo price list', () => {
  it('is seeded for the demo workshop once, and a second seed keeps an owner\'s edits', async () => {
    await seedDemo(api.sequelize);
    const workshop = await api.sequelize.query<{ id: string }>('SELECT id FROM workshops WHERE name = :name', { type: QueryTypes.SELECT, replacements: { name: DEMO_WORKSHOP }, plain: true });
    const read = async () => (await api.sequelize.query<{ items: unknown[] }>('SELECT items FROM price_lists WHERE workshop_id = :id', { type: QueryTypes.SELECT, replacements: { id: workshop!.id }, plain: true }))!.items;
    expect(await read()).toEqual(DEMO_PRICE_LIST.items);
    await api.sequelize.query(`UPDATE price_lists SET items = '[]'::jsonb WHERE workshop_id = :id`, { replacements: { id: workshop!.id } });
    await seedDemo(api.sequelize);
    expect(await read()).toEqual([]);
    await api.sequelize.query('UPDATE price_lists SET items = :items::jsonb WHERE workshop_id = :id', { replacements: { id: workshop!.id, items: JSON.stringify(DEMO_PRICE_LIST.items) } });
  });
});
