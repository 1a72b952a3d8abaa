import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chestSpec, invitationTokens, startApi, type Api } from './support/api.ts';
import { makeDesign, makeShop, type Shop } from './support/world.ts';
import { designListResponse } from '../../shared/schemas/designs.ts';

let api: Api;
let shop: Shop;
beforeAll(async () => {
  api = await startApi();
  shop = await makeShop(api.app, 'designs', invitationTokens(api.mailbox));
});
afterAll(() => api.close());

async function save(designId: string, baseRevision: number, width: number, message = `width ${width}`) {
  return shop.designer.post(`/api/designs/${designId}/revisions`, { baseRevision, spec: chestSpec({ width }), message });
}

describe('creating and saving designs', () => {
  it('stores revision 1 with the engine version and its summary, authored by the creator', async () => {
    const res = await shop.designer.post(`/api/workshops/${shop.workshopId}/designs`, { title: 'Hall chest', spec: chestSpec({ width: 1016 }) });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ title: 'Hall chest', kind: 'chest', archived: false, origin: null, forkCount: 0 });
    expect(res.body.head).toMatchObject({ number: 1, message: 'First revision', author: { id: shop.designer.user!.id } });
    expect(res.body.head.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(res.body.head.summary.widthMm).toBeGreaterThan(0);
    expect(res.body.head.summary.partCount).toBeGreaterThan(0);
    expect(res.body.headRevision.spec.params.width).toBe(1016);
    expect(res.body.approval).toEqual({ state: 'pending', approvedRevision: null, latest: null });
  });

  it('adds revisions on top of the head and refuses a save from an old base with 409 and the current head', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Stale base');
    expect((await save(id, 1, 1100)).status).toBe(201);
    const stale = await save(id, 1, 1200);
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_revision');
    expect(stale.body.error.details.head).toMatchObject({ number: 2, spec: { params: { width: 1100 } } });
    const list = await shop.reviewer.get(`/api/designs/${id}/revisions`);
    expect(list.body.revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
  });

  it('passes the engine\'s own validation through as 400 naming the parameter and its limit', async () => {
    const res = await shop.designer.post(`/api/workshops/${shop.workshopId}/designs`, { title: 'Too wide', spec: chestSpec({ width: 99_999 }) });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('width');
    expect(res.body.error.details[0].limit).toBeTruthy();
  });

  it('keeps a design to one kind: saving another kind is a 400 on spec.kind', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Kind stays');
    const res = await shop.designer.post(`/api/designs/${id}/revisions`, { baseRevision: 1, spec: { schemaVersion: 1, kind: 'dresser', params: {} } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^spec\.kind|^kind/);
  });
});

describe('reading, comparing and restoring', () => {
  it('compares two revisions: changed parameters and the engine\'s resized parts', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Compare me', 1000);
    await save(id, 1, 1050);
    const res = await shop.reviewer.get(`/api/designs/${id}/compare?from=1&to=2`);
    expect(res.status).toBe(200);
    expect(res.body.params).toEqual([{ key: 'params.width', from: 1000, to: 1050 }]);
    expect(res.body.parts.partsResized.length).toBeGreaterThan(0);
    expect(res.body.parts.partsAdded).toEqual([]);
  });

  it('restores an old revision as a new head, leaving history intact', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Restore me', 1000);
    await save(id, 1, 1300);
    const res = await shop.designer.post(`/api/designs/${id}/restore`, { revision: 1, baseRevision: 2 });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ number: 3, restoredFrom: 1, message: 'Restored revision 1', spec: { params: { width: 1000 } } });
    const two = await shop.designer.get(`/api/designs/${id}/revisions/2`);
    expect(two.body.spec.params.width).toBe(1300);
  });

  it('answers 404 for a revision that does not exist', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Missing revision');
    expect((await shop.designer.get(`/api/designs/${id}/revisions/9`)).status).toBe(404);
  });

  it('filters the listing by kind, text, author, date and archive state', async () => {
    const other = await makeShop(api.app, 'designs-filter', invitationTokens(api.mailbox));
    const a = await makeDesign(other.designer, other.workshopId, 'Blanket chest, white oak');
    const b = await makeDesign(other.owner, other.workshopId, 'Toy box 100%_sure');
    const base = `/api/workshops/${other.workshopId}/designs`;
    const titles = async (query: string) => (await other.reviewer.get(`${base}${query}`)).body.designs.map((d: { id: string }) => d.id).sort();
    expect(await titles('')).toEqual([a, b].sort());
    expect(await titles('?q=white%20OAK')).toEqual([a]);
    expect(await titles('?q=100%25_')).toEqual([b]);
    expect(await titles('?q=%25')).toEqual([b]);
    expect(await titles(`?authorId=${other.owner.user!.id}`)).toEqual([b]);
    expect(await titles('?kind=dresser')).toEqual([]);
    expect(await titles(`?updatedAfter=${encodeURIComponent(new Date(Date.now() + 60_000).toISOString())}`)).toEqual([]);
    expect((await other.designer.post(`/api/designs/${a}/archive`)).body.archived).toBe(true);
    expect(await titles('')).toEqual([b]);
    expect(await titles('?archived=true')).toEqual([a]);
    expect(await titles('?archived=all')).toEqual([a, b].sort());
    expect((await other.designer.post(`/api/designs/${a}/unarchive`)).body.archived).toBe(false);
    const bad = await other.reviewer.get(`${base}?kind=sofa`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('kind');
  });

  it('lists each design with its head revision\'s spec, so a card draws the piece without a second request', async () => {
    const other = await makeShop(api.app, 'designs-list-spec', invitationTokens(api.mailbox));
    const id = await makeDesign(other.designer, other.workshopId, 'Listed with its spec', 1000);
    expect((await other.designer.post(`/api/designs/${id}/revisions`, { baseRevision: 1, spec: chestSpec({ width: 1111 }), message: 'wider' })).status).toBe(201);
    const res = await other.reviewer.get(`/api/workshops/${other.workshopId}/designs`);
    expect(res.status).toBe(200);
    const item = res.body.designs.find((d: { id: string }) => d.id === id);
    // The head (revision 2), not the first revision: the card shows the design as it stands.
    expect(item.head.number).toBe(2);
    expect(item.headSpec).toEqual(chestSpec({ width: 1111 }));
    expect(designListResponse.safeParse(res.body).success).toBe(true);
  });

  it('refuses to save an archived design until it is unarchived (409)', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Archived');
    await shop.designer.post(`/api/designs/${id}/archive`);
    expect((await save(id, 1, 1100)).status).toBe(409);
    await shop.designer.post(`/api/designs/${id}/unarchive`);
    expect((await save(id, 1, 1100)).status).toBe(201);
  });
});

describe('forks', () => {
  it('forks a revision into another workshop where the user designs, keeping lineage both ways', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Original', 1000);
    await save(id, 1, 1100);
    const ownShop = (await shop.designer.post('/api/workshops', { name: 'Side project' })).body.id;
    const fork = await shop.designer.post(`/api/designs/${id}/fork`, { workshopId: ownShop, revision: 1, title: 'Variation' });
    expect(fork.status).toBe(201);
    expect(fork.body).toMatchObject({ workshopId: ownShop, title: 'Variation', origin: { designId: id, revisionNumber: 1, title: 'Original', workshopId: shop.workshopId } });
    expect(fork.body.headRevision.spec.params.width).toBe(1000);

    const forDesigner = await shop.designer.get(`/api/designs/${id}`);
    expect(forDesigner.body.forks).toEqual([{ id: fork.body.id, title: 'Variation', workshopId: ownShop, workshopName: 'Side project', fromRevision: 1 }]);
    expect(forDesigner.body.forkCount).toBe(1);
    // The owner is not in the side project: the fork is counted but not shown.
    const forOwner = await shop.owner.get(`/api/designs/${id}`);
    expect(forOwner.body.forks).toEqual([]);
    expect(forOwner.body.hiddenForkCount).toBe(1);
  });

  it('refuses to fork into a workshop where the user is only a reviewer (403) or not a member (404)', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'No fork for you');
    const elsewhere = await makeShop(api.app, 'fork-target', invitationTokens(api.mailbox));
    // The designer of `shop` is invited into `elsewhere` as a reviewer only.
    await elsewhere.owner.post(`/api/workshops/${elsewhere.workshopId}/invitations`, { email: shop.designer.user!.email, role: 'reviewer' });
    const token = await invitationTokens(api.mailbox)(shop.designer.user!.email);
    await shop.designer.post(`/api/invitations/${token}/accept`);
    expect((await shop.designer.post(`/api/designs/${id}/fork`, { workshopId: elsewhere.workshopId })).status).toBe(403);
    const foreign = await makeShop(api.app, 'fork-foreign', invitationTokens(api.mailbox));
    expect((await shop.designer.post(`/api/designs/${id}/fork`, { workshopId: foreign.workshopId })).status).toBe(404);
  });
});

describe('comments and approval', () => {
  it('pins comments to a revision and a part, and lists them by either', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Commented');
    await save(id, 1, 1100);
    expect((await shop.reviewer.post(`/api/designs/${id}/comments`, { body: 'Love the proportions.' })).status).toBe(201);
    const pinned = await shop.reviewer.post(`/api/designs/${id}/comments`, { body: 'Can this rail be wider?', revision: 1, partId: 'front-top-rail' });
    expect(pinned.status).toBe(201);
    expect(pinned.body).toMatchObject({ revision: 1, partId: 'front-top-rail', author: { id: shop.reviewer.user!.id } });
    const onPart = await shop.designer.post(`/api/designs/${id}/comments`, { body: 'On the head', partId: 'leg' });
    expect(onPart.body.revision).toBe(2);
    const byRevision = await shop.owner.get(`/api/designs/${id}/comments?revision=1`);
    expect(byRevision.body.comments.map((c: { body: string }) => c.body)).toEqual(['Can this rail be wider?']);
    const all = await shop.owner.get(`/api/designs/${id}/comments`);
    expect(all.body.comments).toHaveLength(3);
    const missing = await shop.reviewer.post(`/api/designs/${id}/comments`, { body: 'Ghost', revision: 7 });
    expect(missing.status).toBe(400);
    expect(missing.body.error.details[0].path).toBe('revision');
  });

  it('lets a reviewer approve one revision, and the design shows which', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'For approval');
    await save(id, 1, 1100);
    const approved = await shop.reviewer.post(`/api/designs/${id}/approvals`, { revision: 2, decision: 'approved', note: 'Go ahead.' });
    expect(approved.status).toBe(201);
    let design = (await shop.designer.get(`/api/designs/${id}`)).body;
    expect(design.approval).toMatchObject({ state: 'approved', approvedRevision: 2, latest: { revision: 2, decision: 'approved' } });

    await save(id, 2, 1150);
    design = (await shop.designer.get(`/api/designs/${id}`)).body;
    expect(design.approval).toMatchObject({ state: 'approved-earlier', approvedRevision: 2 });

    await shop.reviewer.post(`/api/designs/${id}/approvals`, { revision: 3, decision: 'changes_requested', note: 'Too wide for the hall.' });
    design = (await shop.designer.get(`/api/designs/${id}`)).body;
    expect(design.approval).toMatchObject({ state: 'changes-requested', approvedRevision: 2 });

    // Withdrawing approval of revision 2 leaves nothing approved.
    await shop.reviewer.post(`/api/designs/${id}/approvals`, { revision: 2, decision: 'changes_requested' });
    design = (await shop.designer.get(`/api/designs/${id}`)).body;
    expect(design.approval.approvedRevision).toBeNull();
    const history = await shop.owner.get(`/api/designs/${id}/approvals`);
    expect(history.body.approvals).toHaveLength(3);
  });

  it('refuses approval from a designer (403): approval is the reviewer\'s word', async () => {
    const id = await makeDesign(shop.designer, shop.workshopId, 'Self approval');
    const res = await shop.designer.post(`/api/designs/${id}/approvals`, { revision: 1, decision: 'approved' });
    expect(res.status).toBe(403);
  });
});
