import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chestSpec, invitationTokens, startApi, type Api } from './support/api.ts';
import { makeDesign, makeShop, type Shop } from './support/world.ts';

let api: Api;
let shop: Shop;
beforeAll(async () => {
  // A generous pool wait: this suite is about correctness under contention, not latency.
  api = await startApi({ DB_TIMEOUT_MS: '20000' });
  shop = await makeShop(api.app, 'concurrency', invitationTokens(api.mailbox));
});
afterAll(() => api.close());

async function revisionNumbers(designId: string): Promise<number[]> {
  const [rows] = await api.sequelize.query('SELECT number FROM revisions WHERE design_id = :designId ORDER BY number', { replacements: { designId } });
  return (rows as { number: number }[]).map((r) => r.number);
}

const range = (n: number) => Array.from({ length: n }, (_, i) => i + 1);

describe('saving revisions at the same time', () => {
  it('accepts exactly one of 50 saves from the same base; the other 49 get 409 with the new head', async () => {
    const designId = await makeDesign(shop.designer, shop.workshopId, 'Contended');
    const saves = range(50).map((i) =>
      shop.designer.post(`/api/designs/${designId}/revisions`, { baseRevision: 1, spec: chestSpec({ width: 1000 + i }), message: `save ${i}` }),
    );
    const results = await Promise.all(saves);
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    const winner = results.find((r) => r.status === 201)!;
    for (const loser of results.filter((r) => r.status === 409)) {
      expect(loser.body.error.details.head.number).toBe(2);
      expect(loser.body.error.details.head.message).toBe(winner.body.message);
    }
    expect(await revisionNumbers(designId)).toEqual([1, 2]);
  });

  it('numbers revisions without gaps when clients retry on 409 until each save lands', async () => {
    const designId = await makeDesign(shop.designer, shop.workshopId, 'Retried');
    const writers = 10;
    const writer = async (i: number) => {
      let base = 1;
      for (let attempt = 0; attempt < writers + 1; attempt++) {
        const res = await shop.designer.post(`/api/designs/${designId}/revisions`, { baseRevision: base, spec: chestSpec({ width: 1000 + i }), message: `writer ${i}` });
        if (res.status === 201) return res.body.number as number;
        expect(res.status).toBe(409);
        base = res.body.error.details.head.number;
      }
      throw new Error(`writer ${i} never landed`);
    };
    const landed = await Promise.all(range(writers).map(writer));
    expect([...landed].sort((a, b) => a - b)).toEqual(range(writers).map((n) => n + 1));
    expect(await revisionNumbers(designId)).toEqual(range(writers + 1));
    const head = await shop.designer.get(`/api/designs/${designId}`);
    expect(head.body.head.number).toBe(writers + 1);
  });
});
