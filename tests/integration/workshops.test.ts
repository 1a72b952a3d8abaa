import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymous, invitationTokens, signUp, startApi, type Api } from './support/api.ts';
import { makeShop } from './support/world.ts';

let api: Api;
beforeAll(async () => {
  api = await startApi();
});
afterAll(() => api.close());

describe('workshops', () => {
  it('makes the creator its owner and lists it with the role', async () => {
    const owner = await signUp(api.app, 'ws-create');
    const created = await owner.post('/api/workshops', { name: 'Harbour Bench' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Harbour Bench', role: 'owner', memberCount: 1, designCount: 0 });
    const me = await owner.get('/api/auth/me');
    expect(me.body.workshops).toEqual([{ id: created.body.id, name: 'Harbour Bench', role: 'owner' }]);
  });

  it('keeps at least one owner: the last owner cannot be demoted or removed (409)', async () => {
    const shop = await makeShop(api.app, 'ws-last', invitationTokens(api.mailbox));
    const ownerId = shop.owner.user!.id;
    const demote = await shop.owner.patch(`/api/workshops/${shop.workshopId}/members/${ownerId}`, { role: 'designer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_owner');
    expect((await shop.owner.delete(`/api/workshops/${shop.workshopId}/members/${ownerId}`)).status).toBe(409);
    // With a second owner, the first may step down.
    expect((await shop.owner.patch(`/api/workshops/${shop.workshopId}/members/${shop.designer.user!.id}`, { role: 'owner' })).status).toBe(200);
    expect((await shop.owner.patch(`/api/workshops/${shop.workshopId}/members/${ownerId}`, { role: 'designer' })).body.role).toBe('designer');
  });
});

describe('invitations', () => {
  it('e-mails a link; the invitee previews it, accepts it once and joins with the role given', async () => {
    const owner = await signUp(api.app, 'inv-owner');
    const workshopId = (await owner.post('/api/workshops', { name: 'Dune Road Cabinetry' })).body.id;
    const invitee = await signUp(api.app, 'inv-invitee');
    const sent = await owner.post(`/api/workshops/${workshopId}/invitations`, { email: invitee.user!.email, role: 'reviewer' });
    expect(sent.status).toBe(201);
    expect(sent.body).toMatchObject({ email: invitee.user!.email, role: 'reviewer', acceptedAt: null });
    const token = await invitationTokens(api.mailbox)(invitee.user!.email);

    const preview = await (await anonymous(api.app)).get(`/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ workshopName: 'Dune Road Cabinetry', role: 'reviewer', state: 'open' });

    const accepted = await invitee.post(`/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ workshopId, role: 'reviewer' });
    const members = await owner.get(`/api/workshops/${workshopId}/members`);
    expect(members.body.members.map((m: { email: string; role: string }) => [m.email, m.role])).toContainEqual([invitee.user!.email, 'reviewer']);

    const again = await invitee.post(`/api/invitations/${token}/accept`);
    expect(again.status).toBe(410);
  });

  it('may only be accepted by the account with the invited e-mail (403)', async () => {
    const owner = await signUp(api.app, 'inv-wrong-owner');
    const workshopId = (await owner.post('/api/workshops', { name: 'Wrong Door' })).body.id;
    const invitee = await signUp(api.app, 'inv-wrong-invitee');
    const someoneElse = await signUp(api.app, 'inv-wrong-else');
    await owner.post(`/api/workshops/${workshopId}/invitations`, { email: invitee.user!.email, role: 'designer' });
    const token = await invitationTokens(api.mailbox)(invitee.user!.email);
    const res = await someoneElse.post(`/api/invitations/${token}/accept`);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('wrong_account');
  });

  it('expires: an old link shows as expired and cannot be accepted (410)', async () => {
    const owner = await signUp(api.app, 'inv-exp-owner');
    const workshopId = (await owner.post('/api/workshops', { name: 'Late Post' })).body.id;
    const invitee = await signUp(api.app, 'inv-exp-invitee');
    await owner.post(`/api/workshops/${workshopId}/invitations`, { email: invitee.user!.email, role: 'designer' });
    const token = await invitationTokens(api.mailbox)(invitee.user!.email);
    await api.sequelize.query(`UPDATE invitations SET expires_at = now() - interval '1 minute' WHERE workshop_id = :workshopId`, { replacements: { workshopId } });
    expect((await invitee.get(`/api/invitations/${token}`)).body.state).toBe('expired');
    const res = await invitee.post(`/api/invitations/${token}/accept`);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('invitation_expired');
  });

  it('is refused for someone who is already a member (409)', async () => {
    const shop = await makeShop(api.app, 'inv-dup', invitationTokens(api.mailbox));
    const res = await shop.owner.post(`/api/workshops/${shop.workshopId}/invitations`, { email: shop.reviewer.user!.email, role: 'designer' });
    expect(res.status).toBe(409);
  });
});
