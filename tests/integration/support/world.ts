/**
 * A workshop with an owner, a designer and a reviewer, and a design in it — built through the
 * API the way people would, for the suites that need one.
 */
import type { Express } from 'express';
import { chestSpec, signUp, type Client } from './api.ts';

export interface Shop {
  owner: Client;
  designer: Client;
  reviewer: Client;
  workshopId: string;
}

/** Invite `client` into the workshop with `role` by adding the membership through the owner's invitation. */
export async function addMember(app: Express, owner: Client, workshopId: string, client: Client, role: string, mailboxToken: (email: string) => Promise<string>) {
  const invited = await owner.post(`/api/workshops/${workshopId}/invitations`, { email: client.user!.email, role });
  if (invited.status !== 201) throw new Error(`invite answered ${invited.status}: ${JSON.stringify(invited.body)}`);
  const token = await mailboxToken(client.user!.email);
  const accepted = await client.post(`/api/invitations/${token}/accept`);
  if (accepted.status !== 200) throw new Error(`accept answered ${accepted.status}: ${JSON.stringify(accepted.body)}`);
}

/** A new workshop owned by a new account, with a designer and a reviewer who joined by invitation. */
export async function makeShop(app: Express, label: string, mailboxToken: (email: string) => Promise<string>): Promise<Shop> {
  const [owner, designer, reviewer] = await Promise.all([signUp(app, `${label}-owner`), signUp(app, `${label}-designer`), signUp(app, `${label}-reviewer`)]);
  const created = await owner.post('/api/workshops', { name: `${label} shop` });
  if (created.status !== 201) throw new Error(`create workshop answered ${created.status}`);
  const workshopId: string = created.body.id;
  await addMember(app, owner, workshopId, designer, 'designer', mailboxToken);
  await addMember(app, owner, workshopId, reviewer, 'reviewer', mailboxToken);
  return { owner, designer, reviewer, workshopId };
}

/** A chest design in `workshopId` saved by `client`, returning its id. */
export async function makeDesign(client: Client, workshopId: string, title = 'Test chest', width = 1000): Promise<string> {
  const res = await client.post(`/api/workshops/${workshopId}/designs`, { title, spec: chestSpec({ width }), message: 'First cut' });
  if (res.status !== 201) throw new Error(`create design answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body.id;
}
