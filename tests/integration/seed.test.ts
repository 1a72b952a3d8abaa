import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { DEMO_WORKSHOP, seedDemo } from '../../server/db/seed.ts';
import { buildPiece, defaultSpec } from '../../shared/engine/index.ts';
import { Client, startApi, type Api } from './support/api.ts';

const demo = JSON.parse(readFileSync(new URL('../../server/db/demo-accounts.json', import.meta.url), 'utf8')) as {
  password: string;
  accounts: { role: string; email: string; name: string }[];
};

let api: Api;
beforeAll(async () => {
  api = await startApi();
  await seedDemo(api.sequelize);
});
afterAll(() => api.close());

async function counts() {
  const [rows] = await api.sequelize.query(
    `SELECT (SELECT count(*) FROM users)::int AS users, (SELECT count(*) FROM designs)::int AS designs,
            (SELECT count(*) FROM revisions)::int AS revisions, (SELECT count(*) FROM comments)::int AS comments`,
  );
  return rows[0];
}

describe('seedDemo', () => {
  it('lets each invented demo person sign in to the demo workshop with their role', async () => {
    for (const account of demo.accounts) {
      const client = new Client(api.app);
      const res = await client.login(account.email, demo.password);
      expect(res.status).toBe(200);
      expect(res.body.user.name).toBe(account.name);
      expect(res.body.workshops).toContainEqual(expect.objectContaining({ name: DEMO_WORKSHOP, role: account.role }));
    }
  });

  it('seeds a blanket chest with several revisions, an approval, comments and a fork from revision 2', async () => {
    const reviewer = new Client(api.app);
    const me = await reviewer.login(demo.accounts.find((a) => a.role === 'reviewer')!.email, demo.password);
    const workshopId = me.body.workshops.find((w: { name: string }) => w.name === DEMO_WORKSHOP).id;
    const list = await reviewer.get(`/api/workshops/${workshopId}/designs?kind=chest`);
    const chest = list.body.designs.find((d: { title: string }) => d.title === 'Blanket chest, white oak');
    expect(chest.head.number).toBeGreaterThanOrEqual(3);
    expect(chest.approval.approvedRevision).toBe(3);
    const detail = await reviewer.get(`/api/designs/${chest.id}`);
    expect(detail.body.forks).toHaveLength(1);
    expect(detail.body.forks[0].fromRevision).toBe(2);
    const comments = await reviewer.get(`/api/designs/${chest.id}/comments?partId=lid`);
    expect(comments.body.comments.length).toBeGreaterThanOrEqual(1);
  });

  it('seeds a cherry dresser and a painted maple cabinet for each kind the engine builds', async () => {
    const [rows] = await api.sequelize.query(`SELECT kind, title FROM designs d JOIN workshops w ON w.id = d.workshop_id WHERE w.name = :name`, { replacements: { name: DEMO_WORKSHOP } });
    const kinds = new Set((rows as { kind: string }[]).map((r) => r.kind));
    for (const kind of ['dresser', 'cabinet'] as const) {
      let builds = true;
      try {
        buildPiece(defaultSpec(kind));
      } catch {
        builds = false;
      }
      expect(kinds.has(kind)).toBe(builds);
    }
  });

  it('changes nothing when run again', async () => {
    const before = await counts();
    expect(await seedDemo(api.sequelize)).toBe(false);
    expect(await counts()).toEqual(before);
  });
});
