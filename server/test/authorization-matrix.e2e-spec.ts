import { PROCESS_FILE_FORMAT, PROCESS_FILE_SCHEMA_VERSION } from '@channelwright/shared/schemas';
import type { Response, Test } from 'supertest';
import { ACTORS, createMatrixWorld, uploadCurves, type Actor, type FixtureIds, type MatrixWorld } from './fixtures/authorization/matrix-world.js';
import { nmosTargets } from './fixtures/sheets/sheet-fixtures.js';
import { TEST_CARD_250, test250Definition } from './helpers/characterisation.js';
import { documentedRoutes, registeredRoutes, type RouteKey } from './helpers/registered-routes.js';

// Proof that nobody gets in: every route the server registers, asked by eight actors, against the table below.
// The rules are the product's own (server/src/projects/project-need.ts, docs/architecture.md): a project is hidden
// from whoever is not a member or an admin (404, the answer for a project that does not exist); a member whose
// project role is not enough gets 403; an admin who is not a member reads and manages a project but does not edit
// its sheets, comment or decide reviews; the library is read by whoever a project's sheets lead to it and written
// by admins and process maintainers (403 NOT_PROCESS_MAINTAINER before anything is looked up); extractions are
// their author's (and the maintainers'); a signed-out request gets 401 UNAUTHENTICATED, a disabled account's
// still-valid token 401 ACCOUNT_DISABLED. A refused request that would write must leave every table as it was.

/** One cell: allowed (the route's `ok` status), or refused with 401, 403 or 404. */
type Cell = 'ok' | 401 | 403 | 404;

interface Call {
  actor: Actor;
  ids: FixtureIds;
  world: MatrixWorld;
  /** Throwaway rows `prepare` made for this cell alone. */
  made: Record<string, string>;
  get(path: string): Test;
  post(path: string): Test;
  put(path: string): Test;
  patch(path: string): Test;
  delete(path: string): Test;
}

interface Case {
  /** anonymous, disabled, outsider, viewer, designer, reviewer, owner, admin. */
  cells: string;
  /** What an allowed actor gets. */
  ok: number;
  /** Why an allowed actor gets a 4xx: the fixture cannot (or must not) satisfy the route. */
  because?: string;
  /** Rows this cell may destroy, made afresh for each actor, so every cell is checked on its own. */
  prepare?(world: MatrixWorld): Promise<Record<string, string>>;
  send(call: Call): PromiseLike<Response>;
}

/** The callers who may not read P: signed out, disabled (though a designer of P), or in another project only. */
const OUTSIDE_P = new Set<Actor>(['anonymous', 'disabled', 'outsider']);

/** A made row's id, not a version number kept beside them. */
const isRowId = (value: string) => value.length >= 16;

/** 403 codes that mean "not you": anything else (a bad body, sign-up closed) would hide what the cell checks. */
const REFUSALS_403 = new Set(['FORBIDDEN', 'NOT_PROCESS_MAINTAINER', 'COMMENT_NOT_ALLOWED', 'NOT_ASSIGNED_REVIEWER', 'NOT_REQUEST_AUTHOR']);

const processFile = (name: string) => JSON.stringify({ format: PROCESS_FILE_FORMAT, schemaVersion: PROCESS_FILE_SCHEMA_VERSION, process: test250Definition(name) });
const device = { polarity: 'nmos', id: 10e-6, l: 0.5e-6, vds: 0.6 };
/** A version number to send back (read as the owner, or as `who`), kept as text among a cell's made rows. */
const versionOf = async (world: MatrixWorld, path: string, pick: (body: Record<string, unknown>) => unknown = (body) => body.version, who: 'owner' | 'admin' = 'owner') =>
  String(pick((await world.send(who, 'get', path).expect(200)).body));

//                                                      ano dis out vie des rev own adm
const TABLE: Record<RouteKey, Case> = {
  // The API description and Nest's answer to a path no route takes: public.
  'GET /api/docs-json': { cells: '                      ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/docs-json') },
  'GET /api/docs': { cells: '                           ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/docs') },
  'GET /api/docs/': { cells: '                          ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/docs/') },
  'GET /api/docs/index.html': { cells: '                ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/docs/index.html') },
  'GET /api/docs/swagger-ui-init.js': { cells: '        ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/docs/swagger-ui-init.js') },
  'GET /api/docs/docs/swagger-ui-init.js': { cells: '   ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/docs/docs/swagger-ui-init.js') },
  'GET /api/docs/LICENSE': {
    cells: '                                            ok  ok  ok  ok  ok  ok  ok  ok',
    ok: 404,
    because: 'ROUTE_NOT_FOUND to everyone alike: the Swagger UI registers it, but its package ships no LICENSE file to serve',
    send: (c) => c.get('/api/docs/LICENSE'),
  },
  'ALL /api/*path': { cells: '                          404 404 404 404 404 404 404 404', ok: 404, send: (c) => c.get('/api/no-such-route') },

  // Health and sign-in: public. Each actor signs in as themselves (anonymous as a spare account): the disabled one is refused.
  'GET /api/health': { cells: '                         ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/health') },
  'GET /api/config': { cells: '                         ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/config') },
  'POST /api/auth/register': { cells: '                 ok  ok  ok  ok  ok  ok  ok  ok', ok: 202, send: (c) => c.post('/api/auth/register').send({ email: `new-${c.actor}@matrix.example`, displayName: 'New', password: 'new-account-pass' }) },
  'POST /api/auth/confirm': { cells: '                  ok  ok  ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.post('/api/auth/confirm').send(c.world.pendingConfirmations[c.actor]) },
  'POST /api/auth/login': { cells: '                    ok  401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.post('/api/auth/login').send(signInOf(c)) },
  'GET /api/auth/me': { cells: '                        401 401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/auth/me') },
  'GET /api/mail/mine': { cells: '                      401 401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/mail/mine') },

  // Admins only.
  'GET /api/users': { cells: '                          401 401 403 403 403 403 403 ok', ok: 200, send: (c) => c.get('/api/users') },
  'PATCH /api/users/:id': { cells: '                    401 401 403 403 403 403 403 ok', ok: 200, send: (c) => c.patch(`/api/users/${c.world.accounts.spare.id}`).send({ libraryAccess: false }) },
  'GET /api/admin/mail': { cells: '                     401 401 403 403 403 403 403 ok', ok: 200, send: (c) => c.get('/api/admin/mail') },
  'GET /api/admin/mail/outbox': { cells: '              401 401 403 403 403 403 403 ok', ok: 200, send: (c) => c.get('/api/admin/mail/outbox') },

  // Compute on P's profile: whoever may read it (the outsider's projects do not lead to it).
  'POST /api/compute/size': { cells: '                  401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.post('/api/compute/size').send({ processId: c.ids.profile, ...device, gmId: 12 }) },
  'POST /api/compute/sweep': {
    cells: '                                            401 401 404 ok  ok  ok  ok  ok',
    ok: 200,
    send: (c) => c.post('/api/compute/sweep').send({ processId: c.ids.profile, ...device, vov: 0.2, hold: 'id', sweep: { param: 'vov', from: 0.05, to: 0.4, points: 11 } }),
  },
  'POST /api/compute/corners': {
    cells: '                                            401 401 404 ok  ok  ok  ok  ok',
    ok: 200,
    send: (c) => c.post('/api/compute/corners').send({ processId: c.ids.profile, polarity: 'nmos', l: 0.5e-6, vds: 0.6, w: 2e-6, bias: 'current', id: 10e-6 }),
  },

  // The library: reads follow the projects' sheets; writes are the maintainers' (the admin is one).
  'GET /api/processes': { cells: '                      401 401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/processes') },
  'POST /api/processes': { cells: '                     401 401 403 403 403 403 403 ok', ok: 201, send: (c) => c.post('/api/processes').send({ definition: test250Definition(`Matrix created by ${c.actor}`) }) },
  'GET /api/processes/:id': { cells: '                  401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}`) },
  'PUT /api/processes/:id': {
    cells: '                                            401 401 403 403 403 403 403 ok',
    ok: 200,
    prepare: async (world) => ({ baseVersion: await versionOf(world, `/api/processes/${world.ids.libraryProfile}`, (body) => body.latestVersion, 'admin') }),
    send: (c) =>
      c.put(`/api/processes/${c.ids.libraryProfile}`).send({ baseVersion: Number(c.made.baseVersion), definition: { ...test250Definition('Matrix L250'), description: `Edited by ${c.actor}` }, message: `Edited by ${c.actor}` }),
  },
  'DELETE /api/processes/:id': {
    cells: '                                            401 401 403 403 403 403 403 ok',
    ok: 204,
    prepare: async (world) => ({ profile: await world.throwawayProfile() }),
    send: (c) => c.delete(`/api/processes/${c.made.profile}`),
  },
  'GET /api/processes/:id/versions': { cells: '         401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}/versions`) },
  'GET /api/processes/:id/diff': { cells: '             401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}/diff?from=1&to=1`) },
  'POST /api/processes/:id/deprecate': { cells: '       401 401 403 403 403 403 403 ok', ok: 200, send: (c) => c.post(`/api/processes/${c.ids.libraryProfile}/deprecate`).send({ deprecated: true }) },
  'GET /api/processes/:id/model-card': { cells: '       401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}/model-card`) },
  'GET /api/processes/:id/export': { cells: '           401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}/export`) },
  'POST /api/processes/derive': { cells: '              401 401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.post('/api/processes/derive').send({ tox: 4e-9, substrateDoping: 1e23 }) },
  'POST /api/processes/import': {
    cells: '                                            401 401 403 403 403 403 403 ok',
    ok: 201,
    send: (c) => c.post('/api/processes/import').attach('file', Buffer.from(processFile(`Matrix imported by ${c.actor}`)), 'matrix.json'),
  },
  'POST /api/processes/model-cards/check': {
    cells: '                                            401 401 403 403 403 403 403 ok',
    ok: 200,
    send: (c) => c.post('/api/processes/model-cards/check').field('profileId', c.ids.profile).attach('file', Buffer.from(TEST_CARD_250), 'test-250nm.lib'),
  },

  // Characterisations of P's profile: maintainers start and cancel; whoever reads the profile follows them.
  'POST /api/characterisations': {
    cells: '                                            401 401 403 403 403 403 403 ok',
    ok: 200,
    because: '200, not 202: this version and grid are characterised already, so the answer is the existing job',
    send: (c) => c.post('/api/characterisations').send(c.world.characterisationRequest),
  },
  'GET /api/characterisations/:id': { cells: '          401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/characterisations/${c.ids.characterisation}`) },
  'DELETE /api/characterisations/:id': {
    cells: '                                            401 401 403 403 403 403 403 ok',
    ok: 409,
    because: 'CHARACTERISATION_FINISHED: the fixture job has ended, and cancelling a running one would depend on timing',
    send: (c) => c.delete(`/api/characterisations/${c.ids.characterisation}`),
  },
  'GET /api/processes/:id/characterisations': { cells: '401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}/characterisations`) },
  'GET /api/processes/:id/tables': { cells: '           401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}/tables`) },
  'GET /api/processes/:id/design-chart': { cells: '     401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/processes/${c.ids.profile}/design-chart?polarity=nmos`) },

  // Extractions: anyone who reads the base profile uploads; each reads their own, maintainers all; maintainers save.
  'POST /api/extractions': { cells: '                   401 401 404 ok  ok  ok  ok  ok', ok: 202, send: (c) => uploadCurves(c.post('/api/extractions'), c.ids.extractionProfile) },
  // A fit from P's characterised table: whoever reads the profile may fit (only maintainers save, below).
  'POST /api/extractions/from-table': {
    cells: '         401 401 404 ok  ok  ok  ok  ok',
    ok: 202,
    send: (c) => c.post('/api/extractions/from-table').send({ processId: c.ids.profile, polarity: 'nmos', corner: 'TT', lengths: [0.5e-6] }),
  },
  'GET /api/extractions': { cells: '                    401 401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/extractions') },
  'GET /api/extractions/:id': { cells: '                401 401 404 404 ok  404 404 ok', ok: 200, send: (c) => c.get(`/api/extractions/${c.ids.extraction}`) },
  'GET /api/extractions/:id/points': { cells: '         401 401 404 404 ok  404 404 ok', ok: 200, send: (c) => c.get(`/api/extractions/${c.ids.extraction}/points`) },
  'GET /api/extractions/:id/upload': { cells: '         401 401 404 404 ok  404 404 ok', ok: 200, send: (c) => c.get(`/api/extractions/${c.ids.extraction}/upload`) },
  'DELETE /api/extractions/:id': {
    cells: '                                            401 401 404 404 ok  404 404 ok',
    ok: 409,
    because: 'EXTRACTION_FINISHED: the fixture fit has ended, and cancelling a running one would depend on timing',
    send: (c) => c.delete(`/api/extractions/${c.ids.extraction}`),
  },
  'POST /api/extractions/:id/rerun': { cells: '         401 401 404 404 ok  404 404 ok', ok: 202, send: (c) => c.post(`/api/extractions/${c.ids.extraction}/rerun`).send({}) },
  'POST /api/extractions/:id/save': { cells: '          401 401 403 403 403 403 403 ok', ok: 201, send: (c) => c.post(`/api/extractions/${c.ids.extraction}/save`).send({ message: 'Saved by the matrix' }) },

  // Projects: everyone creates their own; members read; owners (and admins) manage.
  'GET /api/projects': { cells: '                       401 401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/projects') },
  'POST /api/projects': { cells: '                      401 401 ok  ok  ok  ok  ok  ok', ok: 201, send: (c) => c.post('/api/projects').send({ name: `Matrix project of ${c.actor}` }) },
  'GET /api/projects/:id': { cells: '                   401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/projects/${c.ids.project}`) },
  'PATCH /api/projects/:id': {
    cells: '                                            401 401 404 403 403 403 ok  ok',
    ok: 200,
    prepare: async (world) => ({ version: await versionOf(world, `/api/projects/${world.ids.project}`) }),
    send: (c) => c.patch(`/api/projects/${c.ids.project}`).send({ version: Number(c.made.version), description: `Described by ${c.actor}` }),
  },
  'GET /api/projects/:id/audit': { cells: '             401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/projects/${c.ids.project}/audit`) },
  'GET /api/projects/:id/members': { cells: '           401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/projects/${c.ids.project}/members`) },
  'POST /api/projects/:id/members': {
    cells: '                                            401 401 404 403 403 403 ok  ok',
    ok: 201,
    send: (c) => c.post(`/api/projects/${c.ids.project}/members`).send({ email: `invitee-${c.actor}@matrix.example`, role: 'viewer' }),
  },
  'PATCH /api/projects/:id/members/:userId': {
    cells: '                                            401 401 404 403 403 403 ok  ok',
    ok: 200,
    send: (c) => c.patch(`/api/projects/${c.ids.project}/members/${c.world.accounts.spare.id}`).send({ role: 'viewer' }),
  },
  'DELETE /api/projects/:id/members/:userId': {
    cells: '                                            401 401 404 403 403 403 ok  ok',
    ok: 204,
    prepare: async (world) => {
      const added = await world.send('owner', 'post', `/api/projects/${world.ids.project}/members`).send({ email: world.accounts.leaver.email, role: 'viewer' });
      if (added.status !== 201 && added.body.code !== 'MEMBER_EXISTS') throw new Error(`re-adding the leaver answered ${added.status}`);
      return {};
    },
    send: (c) => c.delete(`/api/projects/${c.ids.project}/members/${c.world.accounts.leaver.id}`),
  },

  // Sheets and devices: members read; designers and owners write (an admin who is not a member does not).
  'GET /api/projects/:id/sheets': { cells: '            401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/projects/${c.ids.project}/sheets`) },
  'POST /api/projects/:id/sheets': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 201,
    send: (c) => c.post(`/api/projects/${c.ids.project}/sheets`).send({ name: `Matrix sheet of ${c.actor}`, processId: c.ids.profile }),
  },
  'GET /api/sheets/:id': { cells: '                     401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/sheets/${c.ids.sheet}`) },
  'PATCH /api/sheets/:id': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 200,
    prepare: async (world) => ({ version: await versionOf(world, `/api/sheets/${world.ids.sheet}`) }),
    send: (c) => c.patch(`/api/sheets/${c.ids.sheet}`).send({ version: Number(c.made.version), description: `Described by ${c.actor}` }),
  },
  'DELETE /api/sheets/:id': { cells: '                  401 401 404 403 ok  403 ok  403', ok: 204, prepare: (world) => world.throwawaySheet(), send: (c) => c.delete(`/api/sheets/${c.made.sheet}`) },
  'POST /api/sheets/:id/recompute': { cells: '          401 401 404 403 ok  403 ok  403', ok: 200, send: (c) => c.post(`/api/sheets/${c.ids.sheet}/recompute`) },
  'POST /api/sheets/:id/migrate': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 200,
    send: (c) => c.post(`/api/sheets/${c.ids.sheet}/migrate`).send({ processId: c.ids.extractionProfile, preview: true }),
  },
  'GET /api/sheets/:id/devices': { cells: '             401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/sheets/${c.ids.sheet}/devices`) },
  'POST /api/sheets/:id/devices': { cells: '            401 401 404 403 ok  403 ok  403', ok: 201, send: (c) => c.post(`/api/sheets/${c.ids.sheet}/devices`).send(nmosTargets({ name: `M-${c.actor}` })) },
  'PATCH /api/sheets/:id/devices/:deviceId': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 200,
    prepare: async (world) => ({ version: await versionOf(world, `/api/sheets/${world.ids.sheet}`, (sheet) => (sheet.devices as Array<{ id: string; version: number }>).find((d) => d.id === world.ids.device)?.version) }),
    send: (c) => c.patch(`/api/sheets/${c.ids.sheet}/devices/${c.ids.device}`).send({ version: Number(c.made.version), notes: `Noted by ${c.actor}` }),
  },
  'DELETE /api/sheets/:id/devices/:deviceId': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 204,
    prepare: (world) => world.throwawaySheet(),
    send: (c) => c.delete(`/api/sheets/${c.made.sheet}/devices/${c.made.device}`),
  },
  'POST /api/sheets/:id/corners': { cells: '            401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.post(`/api/sheets/${c.ids.sheet}/corners`).send({}) },
  'GET /api/sheets/:id/leakage': { cells: '             401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/sheets/${c.ids.sheet}/leakage`) },
  'POST /api/sheets/:id/match-groups/resize': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 200,
    send: (c) => c.post(`/api/sheets/${c.ids.sheet}/match-groups/resize`).send({ group: 'pair', sigmaVos: 2e-3 }),
  },
  'GET /api/sheets/:id/export': { cells: '              401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/sheets/${c.ids.sheet}/export?format=csv`) },
  'POST /api/sheets/:id/import': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 200,
    send: (c) => c.post(`/api/sheets/${c.ids.sheet}/import`).field('mode', 'preview').attach('file', Buffer.from(c.world.sheetCsv), 'sheet.csv'),
  },
  'GET /api/sheets/:id/review-state': { cells: '        401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/sheets/${c.ids.sheet}/review-state`) },

  // Revisions: designers and owners freeze; members read; nobody changes one (the allowed get the 409 that says so).
  'POST /api/sheets/:id/revisions': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 201,
    prepare: (world) => world.throwawaySheet(),
    send: (c) => c.post(`/api/sheets/${c.made.sheet}/revisions`).send({ message: `Frozen by ${c.actor}` }),
  },
  'GET /api/sheets/:id/revisions': { cells: '           401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/sheets/${c.ids.sheet}/revisions`) },
  'GET /api/revisions/:id': { cells: '                  401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/revisions/${c.ids.revision}`) },
  'GET /api/revisions/:id/verify': { cells: '           401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/revisions/${c.ids.revision}/verify`) },
  'GET /api/revisions/:id/diff': { cells: '             401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/revisions/${c.ids.revision}/diff`) },
  'PATCH /api/revisions/:id': { cells: '                401 401 404 403 ok  403 ok  403', ok: 409, because: 'REVISION_IMMUTABLE, always', send: (c) => c.patch(`/api/revisions/${c.ids.revision}`).send({}) },
  'DELETE /api/revisions/:id': { cells: '               401 401 404 403 ok  403 ok  403', ok: 409, because: 'REVISION_IMMUTABLE, always', send: (c) => c.delete(`/api/revisions/${c.ids.revision}`) },
  'PATCH /api/revisions/:id/devices/:deviceId': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 409,
    because: 'REVISION_IMMUTABLE, always',
    send: (c) => c.patch(`/api/revisions/${c.ids.revision}/devices/${c.ids.revisionDevice}`).send({}),
  },
  'DELETE /api/revisions/:id/devices/:deviceId': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 409,
    because: 'REVISION_IMMUTABLE, always',
    send: (c) => c.delete(`/api/revisions/${c.ids.revision}/devices/${c.ids.revisionDevice}`),
  },

  // Reviews: designers and owners ask; only the assigned reviewer decides; only the requester withdraws.
  'POST /api/revisions/:id/review-requests': {
    cells: '                                            401 401 404 403 ok  403 ok  403',
    ok: 201,
    prepare: async (world) => ({ revision: await world.throwawayRevision() }),
    send: (c) => c.post(`/api/revisions/${c.made.revision}/review-requests`).send({ reviewerId: c.world.accounts.reviewer.id }),
  },
  'GET /api/revisions/:id/review-requests': { cells: '  401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/revisions/${c.ids.revision}/review-requests`) },
  'GET /api/review-requests': { cells: '                401 401 ok  ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get('/api/review-requests') },
  'GET /api/review-requests/:id': { cells: '            401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/review-requests/${c.ids.reviewRequest}`) },
  'POST /api/review-requests/:id/decision': {
    cells: '                                            401 401 404 403 403 ok  403 403',
    ok: 200,
    prepare: async (world) => ({ request: await world.throwawayReviewRequest() }),
    send: (c) => c.post(`/api/review-requests/${c.made.request}/decision`).send({ decision: 'approve' }),
  },
  'POST /api/review-requests/:id/withdraw': {
    cells: '                                            401 401 404 403 ok  403 403 403',
    ok: 200,
    prepare: async (world) => ({ request: await world.throwawayReviewRequest() }),
    send: (c) => c.post(`/api/review-requests/${c.made.request}/withdraw`),
  },
  'GET /api/revisions/:id/comments': { cells: '         401 401 404 ok  ok  ok  ok  ok', ok: 200, send: (c) => c.get(`/api/revisions/${c.ids.revision}/comments`) },
  'POST /api/revisions/:id/comments': { cells: '        401 401 404 403 ok  ok  ok  403', ok: 201, send: (c) => c.post(`/api/revisions/${c.ids.revision}/comments`).send({ body: `Comment by ${c.actor}` }) },
};

function signInOf(call: Call): { email: string; password: string } {
  const account = call.actor === 'anonymous' ? call.world.accounts.spare : call.world.accounts[call.actor];
  return { email: account.email, password: account.password };
}

function cellsOf(route: RouteKey, row: Case): Cell[] {
  const cells = row.cells.trim().split(/\s+/).map((cell) => (cell === 'ok' ? 'ok' : (Number(cell) as Cell)));
  if (cells.length !== ACTORS.length || cells.some((cell) => cell !== 'ok' && ![401, 403, 404].includes(cell))) throw new Error(`${route}: the row must hold ${ACTORS.length} cells of ok, 401, 403, 404`);
  return cells;
}

/** What is wrong with one answer, or null when it is the cell's. */
function mismatch(route: RouteKey, row: Case, actor: Actor, expected: Cell, response: Response): string | null {
  const code: string | undefined = response.body?.code;
  const got = `${response.status}${code ? ` ${code}` : ''}`;
  const want = expected === 'ok' ? row.ok : expected;
  if (response.status !== want) return `${route} as ${actor}: expected ${expected === 'ok' ? `ok (${row.ok})` : expected}, got ${got}`;
  if (expected === 401) {
    const reason = actor === 'anonymous' ? 'UNAUTHENTICATED' : 'ACCOUNT_DISABLED';
    if (code !== reason) return `${route} as ${actor}: expected 401 ${reason}, got ${got}`;
  }
  if (expected === 403 && !REFUSALS_403.has(code ?? '')) return `${route} as ${actor}: expected a 403 that refuses the caller, got ${got}`;
  // A 404 must be the resource hidden, not a path the table got wrong (Nest's ROUTE_NOT_FOUND), but for the catch-all.
  if (expected === 404 && !(route === 'ALL /api/*path' ? code === 'ROUTE_NOT_FOUND' : code !== 'ROUTE_NOT_FOUND' && /_NOT_FOUND$/.test(code ?? ''))) {
    return `${route} as ${actor}: expected a 404 that hides the resource, got ${got}`;
  }
  return null;
}

jest.setTimeout(900_000);

describe('the authorization matrix: every registered route × every kind of caller', () => {
  let world: MatrixWorld;
  let registered: RouteKey[];

  beforeAll(async () => {
    world = await createMatrixWorld();
    registered = registeredRoutes(world.t.app);
  });
  afterAll(() => world?.t.close());

  it('has a row for every route the server registers, and none for a route it does not', () => {
    expect(registered.length).toBeGreaterThan(80);
    expect(new Set(registered).size).toBe(registered.length);
    expect({ missingFromTable: registered.filter((route) => !(route in TABLE)) }).toEqual({ missingFromTable: [] });
    expect({ notRegistered: Object.keys(TABLE).filter((route) => !registered.includes(route)) }).toEqual({ notRegistered: [] });
  });

  it('registers exactly the routes the OpenAPI document describes, besides the document itself and the not-found handler', async () => {
    const documented = documentedRoutes((await world.send('anonymous', 'get', '/api/docs-json').expect(200)).body);
    const undocumentedByDesign = (route: RouteKey) => route === 'ALL /api/*path' || /^GET \/api\/docs(\/|-json$|$)/.test(route);
    expect({ undocumented: registered.filter((route) => !undocumentedByDesign(route) && !documented.includes(route)) }).toEqual({ undocumented: [] });
    expect({ documentedButNotRegistered: documented.filter((route) => !registered.includes(route)) }).toEqual({ documentedButNotRegistered: [] });
  });

  it('answers every cell as the table says; a refused write changes nothing, and no answer to those outside P names a row of P', async () => {
    const problems: string[] = [];
    const summary: string[] = [];
    let cellsChecked = 0;
    // Whatever they are answered, those outside P never read an id of P's rows (nor of the profile nobody uses).
    const { otherProject: _theirs, ...ofP } = world.ids;
    const hiddenFromOutside = Object.values(ofP);
    for (const route of registered) {
      const row = TABLE[route];
      if (!row) continue; // the first test names it
      const cells = cellsOf(route, row);
      const answers: string[] = [];
      for (const [index, actor] of ACTORS.entries()) {
        const made = row.prepare ? await row.prepare(world) : {};
        const writes = !route.startsWith('GET ');
        const before = writes ? await world.digest() : '';
        const as = (method: 'get' | 'post' | 'put' | 'patch' | 'delete') => (path: string) => world.send(actor, method, path);
        const response = await row.send({ actor, ids: world.ids, world, made, get: as('get'), post: as('post'), put: as('put'), patch: as('patch'), delete: as('delete') });
        cellsChecked += 1;
        answers.push(String(response.status));
        const wrong = mismatch(route, row, actor, cells[index]!, response);
        if (wrong) problems.push(wrong);
        if (writes && response.status >= 300 && (await world.digest()) !== before) problems.push(`${route} as ${actor}: answered ${response.status} but changed stored rows`);
        const leaked = OUTSIDE_P.has(actor) ? [...hiddenFromOutside, ...Object.values(made).filter(isRowId)].filter((id) => response.text?.includes(id)) : [];
        if (leaked.length > 0) problems.push(`${route} as ${actor}: the answer names rows of P (${leaked.join(', ')})`);
        await world.settle();
      }
      summary.push(`${route.padEnd(46)}${answers.map((a) => a.padStart(6)).join('')}${row.because ? `   allowed: ${row.because}` : ''}`);
    }
    process.stdout.write(
      `authorization matrix: ${Object.keys(TABLE).length} routes × ${ACTORS.length} actors = ${cellsChecked} cells\n${''.padEnd(46)}${ACTORS.map((a) => a.slice(0, 5).padStart(6)).join('')}\n${summary.join('\n')}\n`,
    );
    expect(problems).toEqual([]);
    expect(cellsChecked).toBe(registered.length * ACTORS.length);
  });
});
