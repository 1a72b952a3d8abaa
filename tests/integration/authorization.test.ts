/**
 * The authorisation matrix: every API route × anonymous, outsider (a member of another
 * workshop), reviewer, designer and owner. Expected statuses come from each route's declared
 * access rule and the role table in shared/permissions.ts; the suite fails for a route the app
 * serves that is not in the route table, and for a route in the table with no case here.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Router } from 'express';
import { DEFAULT_STOCK_SETTINGS } from '../../shared/materials/stockSettings.ts';
import { can, type Role } from '../../shared/permissions.ts';
import type { RouteDef } from '../../server/auth/access.ts';
import { hashToken, newToken } from '../../server/auth/tokens.ts';
import { modelsFor } from '../../server/db/models/index.ts';
import { createAuth } from '../../server/auth/index.ts';
import { createDesignService } from '../../server/features/designs/designs.service.ts';
import { apiRouteTable } from '../../server/features/routeTable.ts';
import type { Client} from './support/api.ts';
import { PASSWORD, anonymous, chestSpec, signUp, startApi, uniqueEmail, type Api } from './support/api.ts';
import { testConfig } from '../support/testApp.ts';
import { createSequelize } from '../../server/db/sequelize.ts';

type Persona = 'anonymous' | 'outsider' | Role;
const PERSONAS: Persona[] = ['anonymous', 'outsider', 'reviewer', 'designer', 'owner'];

/** A fresh workshop for one case: the three member personas in their roles, a design with two revisions. */
interface World {
  workshopId: string;
  designId: string;
  invitationId: string;
  users: Record<Role | 'outsider', { id: string; email: string }>;
}

interface Case {
  /** Status when the caller is allowed. */
  success: number;
  /** Path (under /api) and body for this world and caller. */
  request: (world: World, persona: Persona) => Promise<{ path: string; body?: unknown }> | { path: string; body?: unknown };
  /** The call changes who is signed in: make it from a separate session of the same persona. */
  ownSession?: boolean;
}

let api: Api;
const clients = {} as Record<Persona, Client>;

/** The routes served by the app but kept outside the route table, with their rule. */
const INFRASTRUCTURE: { method: string; path: string; success: number }[] = [{ method: 'get', path: '/health', success: 200 }];

async function resetToken(): Promise<string> {
  const user = await signUp(api.app, 'matrix-reset');
  const { token, hash } = newToken();
  await modelsFor(api.sequelize).PasswordReset.create({ userId: user.user!.id, tokenHash: hash, expiresAt: new Date(Date.now() + 60_000) });
  return token;
}

async function invitationToken(email: string): Promise<string> {
  const models = modelsFor(api.sequelize);
  const workshop = await models.Workshop.create({ name: 'Inviting shop' });
  const { token, hash } = newToken();
  await models.Invitation.create({ workshopId: workshop.id, email, role: 'designer', tokenHash: hash, invitedBy: null, expiresAt: new Date(Date.now() + 60_000) });
  return token;
}

const CASES: Record<string, Case> = {
  'get /auth/csrf': { success: 200, request: () => ({ path: '/auth/csrf' }) },
  'post /auth/register': { success: 201, ownSession: true, request: () => ({ path: '/auth/register', body: { email: uniqueEmail('matrix-reg'), name: 'New', password: PASSWORD } }) },
  'post /auth/login': {
    success: 200, ownSession: true,
    request: async () => {
      const someone = await signUp(api.app, 'matrix-login');
      return { path: '/auth/login', body: { email: someone.user!.email, password: PASSWORD } };
    },
  },
  'post /auth/logout': { success: 204, ownSession: true, request: () => ({ path: '/auth/logout' }) },
  'get /auth/me': { success: 200, request: () => ({ path: '/auth/me' }) },
  'post /auth/password-reset': { success: 202, request: () => ({ path: '/auth/password-reset', body: { email: uniqueEmail('matrix-forgot') } }) },
  'post /auth/password-reset/confirm': { success: 204, request: async () => ({ path: '/auth/password-reset/confirm', body: { token: await resetToken(), password: 'a new password here' } }) },
  'get /workshops': { success: 200, request: () => ({ path: '/workshops' }) },
  'post /workshops': { success: 201, request: () => ({ path: '/workshops', body: { name: 'Another shop' } }) },
  'get /workshops/:workshopId': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}` }) },
  'patch /workshops/:workshopId': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}`, body: { name: 'Renamed' } }) },
  'delete /workshops/:workshopId': { success: 204, request: (w) => ({ path: `/workshops/${w.workshopId}` }) },
  'get /workshops/:workshopId/members': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}/members` }) },
  'patch /workshops/:workshopId/members/:userId': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}/members/${w.users.designer.id}`, body: { role: 'reviewer' } }) },
  'delete /workshops/:workshopId/members/:userId': { success: 204, request: (w) => ({ path: `/workshops/${w.workshopId}/members/${w.users.designer.id}` }) },
  'get /workshops/:workshopId/invitations': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}/invitations` }) },
  'post /workshops/:workshopId/invitations': { success: 201, request: (w) => ({ path: `/workshops/${w.workshopId}/invitations`, body: { email: uniqueEmail('matrix-invite'), role: 'reviewer' } }) },
  'delete /workshops/:workshopId/invitations/:invitationId': { success: 204, request: (w) => ({ path: `/workshops/${w.workshopId}/invitations/${w.invitationId}` }) },
  'get /invitations/:token': { success: 200, request: async () => ({ path: `/invitations/${await invitationToken(uniqueEmail('matrix-preview'))}` }) },
  'post /invitations/:token/accept': {
    success: 200,
    request: async (w, persona) => {
      const email = persona === 'anonymous' ? uniqueEmail('matrix-nobody') : w.users[persona].email;
      return { path: `/invitations/${await invitationToken(email)}/accept` };
    },
  },
  'get /workshops/:workshopId/designs': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}/designs?kind=chest` }) },
  'post /workshops/:workshopId/designs': { success: 201, request: (w) => ({ path: `/workshops/${w.workshopId}/designs`, body: { title: 'New chest', spec: chestSpec({ width: 900 }) } }) },
  'get /designs/:designId': { success: 200, request: (w) => ({ path: `/designs/${w.designId}` }) },
  'patch /designs/:designId': { success: 200, request: (w) => ({ path: `/designs/${w.designId}`, body: { title: 'Retitled' } }) },
  'get /designs/:designId/revisions': { success: 200, request: (w) => ({ path: `/designs/${w.designId}/revisions` }) },
  'post /designs/:designId/revisions': { success: 201, request: (w) => ({ path: `/designs/${w.designId}/revisions`, body: { baseRevision: 2, spec: chestSpec({ width: 1200 }), message: 'wider' } }) },
  'get /designs/:designId/revisions/:number': { success: 200, request: (w) => ({ path: `/designs/${w.designId}/revisions/1` }) },
  'get /designs/:designId/compare': { success: 200, request: (w) => ({ path: `/designs/${w.designId}/compare?from=1&to=2` }) },
  'post /designs/:designId/restore': { success: 201, request: (w) => ({ path: `/designs/${w.designId}/restore`, body: { revision: 1, baseRevision: 2 } }) },
  'post /designs/:designId/fork': { success: 201, request: (w) => ({ path: `/designs/${w.designId}/fork`, body: { workshopId: w.workshopId } }) },
  'post /designs/:designId/archive': { success: 200, request: (w) => ({ path: `/designs/${w.designId}/archive` }) },
  'post /designs/:designId/unarchive': { success: 200, request: (w) => ({ path: `/designs/${w.designId}/unarchive` }) },
  'get /designs/:designId/comments': { success: 200, request: (w) => ({ path: `/designs/${w.designId}/comments` }) },
  'post /designs/:designId/comments': { success: 201, request: (w) => ({ path: `/designs/${w.designId}/comments`, body: { body: 'A note', revision: 1, partId: 'leg' } }) },
  'get /designs/:designId/approvals': { success: 200, request: (w) => ({ path: `/designs/${w.designId}/approvals` }) },
  'post /designs/:designId/approvals': { success: 201, request: (w) => ({ path: `/designs/${w.designId}/approvals`, body: { revision: 2, decision: 'approved' } }) },
  'get /workshops/:workshopId/price-list': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}/price-list` }) },
  'put /workshops/:workshopId/price-list': {
    success: 200,
    request: (w) => ({ path: `/workshops/${w.workshopId}/price-list`, body: { currency: 'USD', items: [{ kind: 'sheet', sheetId: 'hardwood-plywood-3/4', pricePerSheetCents: 9000 }] } }),
  },
  'post /workshops/:workshopId/price-list/csv': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}/price-list/csv`, body: 'kind,item,price\nsheet,hardwood-plywood-3/4,90.00\n' }) },
  'get /workshops/:workshopId/stock': { success: 200, request: (w) => ({ path: `/workshops/${w.workshopId}/stock` }) },
  'put /workshops/:workshopId/stock': {
    success: 200,
    request: (w) => ({
      path: `/workshops/${w.workshopId}/stock`,
      // A fresh world has no stock stored yet: the first save starts from version null.
      body: { version: null, stock: { ...DEFAULT_STOCK_SETTINGS, boardsInStock: [{ speciesId: 'white-oak', quarters: 4, lengthMm: 1829, widthMm: 178, defects: [{ kind: 'knot', fromEndMm: 900, fromEdgeMm: 60, lengthMm: 30, widthMm: 30 }] }] } },
    }),
  },
  'get /dev/mail': { success: 200, request: () => ({ path: '/dev/mail' }) },
};

/** What `persona` must get from a route with `access`, according to the rule table. */
function expectedStatus(route: RouteDef, persona: Persona, success: number): number {
  const { access } = route;
  if (access.kind === 'public') return success;
  if (persona === 'anonymous') return 401;
  if (access.kind === 'signedIn') return success;
  if (persona === 'outsider') return 404;
  return can(persona, access.action) ? success : 403;
}

const key = (method: string, path: string) => `${method} ${path}`;

function describeAccess(route: RouteDef): string {
  return route.access.kind === 'member' ? `members allowed ${route.access.action}` : route.access.kind === 'signedIn' ? 'anyone signed in' : 'anyone';
}

async function makeWorld(): Promise<World> {
  const models = modelsFor(api.sequelize);
  const users = Object.fromEntries(
    (['owner', 'designer', 'reviewer', 'outsider'] as const).map((p) => [p, { id: clients[p].user!.id, email: clients[p].user!.email }]),
  ) as World['users'];
  const workshop = await models.Workshop.create({ name: 'Matrix shop' });
  for (const role of ['owner', 'designer', 'reviewer'] as const) {
    await models.Membership.create({ workshopId: workshop.id, userId: users[role].id, role });
  }
  const designs = createDesignService(api.sequelize, models);
  const design = await designs.create(workshop.id, users.designer.id, { title: 'Matrix chest', spec: chestSpec({ width: 1000 }), message: 'one' });
  await designs.save(design.id, users.designer.id, { baseRevision: 1, spec: chestSpec({ width: 1100 }), message: 'two' });
  const invitation = await models.Invitation.create({
    workshopId: workshop.id, email: uniqueEmail('matrix-pending'), role: 'reviewer', tokenHash: hashToken(newToken().token), invitedBy: users.owner.id, expiresAt: new Date(Date.now() + 60_000),
  });
  return { workshopId: workshop.id, designId: design.id, invitationId: invitation.id, users };
}

/** Every (method, path) the running app serves under /api, read from Express's router stack. */
function servedRoutes(router: Router): { method: string; path: string }[] {
  const found: { method: string; path: string }[] = [];
  type Layer = { route?: { path: string; methods: Record<string, boolean> }; handle?: { stack?: Layer[] } };
  // Depth 0 is the app itself (its only route is the client's catch-all); the API routers are nested.
  const walk = (layers: Layer[], depth: number) => {
    for (const layer of layers) {
      if (layer.route && depth > 0) for (const method of Object.keys(layer.route.methods)) found.push({ method, path: layer.route.path });
      else if (layer.handle?.stack) walk(layer.handle.stack, depth + 1);
    }
  };
  walk((router as unknown as { stack: Layer[] }).stack, 0);
  return found;
}

// The route table, built at collection time from the same function the app mounts, so each
// route gets its own test; only the declarations (method, path, access) are read from it.
const declared = (() => {
  const config = testConfig();
  const sequelize = createSequelize(config.databaseUrl);
  const models = modelsFor(sequelize);
  const auth = createAuth(config, models);
  const inbox = { port: 0, messages: () => [], close: async () => {} };
  const routes = apiRouteTable({ config, sequelize, mailbox: inbox, models, auth, mailer: { send: async () => {} }, publicUrl: 'http://127.0.0.1' });
  return { routes, close: async () => { await sequelize.close(); await auth.sessionPool.end(); } };
})();
const table: RouteDef[] = declared.routes;

beforeAll(async () => {
  api = await startApi();
  clients.anonymous = await anonymous(api.app);
  for (const persona of ['outsider', 'reviewer', 'designer', 'owner'] as const) clients[persona] = await signUp(api.app, `matrix-${persona}`);
  // The outsider belongs to a workshop of its own.
  await clients.outsider.post('/api/workshops', { name: 'Somewhere else' });
});
afterAll(async () => {
  await api.close();
  await declared.close();
});

describe('the route table', () => {
  it('covers every route the app serves (a route mounted without a rule fails here)', () => {
    const appRouter = (api.app as unknown as { router: Router }).router;
    const served = servedRoutes(appRouter).map((r) => key(r.method, r.path));
    const declared = new Set([...table.map((r) => key(r.method, r.path)), ...INFRASTRUCTURE.map((r) => key(r.method, r.path))]);
    expect(served.filter((r) => !declared.has(r))).toEqual([]);
    expect(served.length).toBeGreaterThanOrEqual(declared.size);
  });

  it('has a matrix case for every declared route', () => {
    expect(table.map((r) => key(r.method, r.path)).filter((k) => !CASES[k])).toEqual([]);
    expect(table.length).toBe(Object.keys(CASES).length);
  });
});

describe('the authorisation matrix', () => {
  for (const route of table) {
    it(`${route.method.toUpperCase()} ${route.path}: ${describeAccess(route)}`, async () => {
      const spec = CASES[key(route.method, route.path)];
      expect(spec, 'a matrix case for this route').toBeDefined();
      const got: Record<string, number> = {};
      const want: Record<string, number> = {};
      for (const persona of PERSONAS) {
        const world = await makeWorld();
        const { path, body } = await spec!.request(world, persona);
        let client = clients[persona];
        if (spec!.ownSession) {
          client = await anonymous(api.app);
          if (persona !== 'anonymous') await client.login(clients[persona].user!.email);
        }
        const res = await client.send(route.method, `/api${path}`, body);
        got[persona] = res.status;
        want[persona] = expectedStatus(route, persona, spec!.success);
        if (res.status >= 400) expect(res.body.error.code).toEqual(expect.any(String));
      }
      expect(got).toEqual(want);
    });
  }

  it('serves the infrastructure routes to everyone', async () => {
    for (const route of INFRASTRUCTURE) {
      for (const persona of PERSONAS) expect((await clients[persona].send(route.method as 'get', `/api${route.path}`)).status).toBe(route.success);
    }
  });
});
