import { RequestMethod, type INestApplication } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { DiscoveryService, MetadataScanner, ModulesContainer } from '@nestjs/core';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestApp } from './app-factory';
import { createProviderAccount } from './fake-provider';
import { createMatrixPlans, type MatrixPlans } from './matrix-plans';
import { createReviewMatrixPlans, type ReviewMatrixPlans } from './matrix-review';
import { PLAN, SLED_DXF } from './plan-helpers';
import { CookieJar, CSRF, signInAs } from './sign-in-flow';

/**
 * Who may use which route: every route of the app × every kind of visitor, with the status each
 * gets. Generated from this one table; a route the app has and the table lacks fails the first test,
 * so a new route cannot ship without its row.
 *
 * - member: signed in, no tie to the thing asked about; owner: the thing is theirs; other: another
 *   plain member; suspended: a suspended member — on routes about one member's things, their own
 *   (to show that they can read but not write).
 * - Admin actions all act on one separate target member, so that no actor changes under the table.
 */
const ACTORS = ['anonymous', 'member', 'owner', 'other', 'moderator', 'admin', 'suspended'] as const;
type Actor = (typeof ACTORS)[number];
type Statuses = Record<Actor, number>;

interface Logins {
  owner: string;
  suspended: string;
  target: string;
  /** The owner's plans, and the suspended member's own (changes to them are refused all the same). */
  plans: { owner: MatrixPlans; suspended: MatrixPlans };
  /** The owner's plans that review decisions change. */
  review: ReviewMatrixPlans;
}

interface Row {
  path: (logins: Logins, actor: Actor) => string;
  expect: Statuses;
  body?: object | ((logins: Logins, actor: Actor) => object);
  /** A file sent as the multipart field `file`. */
  file?: { bytes: Buffer; name: string };
  /** Sign in afresh for this row, as it ends the session it is sent with. */
  freshSession?: boolean;
}

const everyone = (status: number): Statuses => Object.fromEntries(ACTORS.map((actor) => [actor, status])) as Statuses;
const signedIn = (status: number, overrides: Partial<Statuses> = {}): Statuses => ({
  ...everyone(status),
  anonymous: 401,
  ...overrides,
});
const adminsOnly = (status: number): Statuses => signedIn(403, { admin: status });
const moderatorsOnly = (status: number): Statuses => signedIn(403, { moderator: status, admin: status });
const ownersOnly = (status: number, suspended: number): Statuses => signedIn(403, { owner: status, suspended });

const fixed = (path: string) => () => path;
const ownSettings = ({ owner, suspended }: Logins, actor: Actor) =>
  `/api/members/${actor === 'suspended' ? suspended : owner}/settings`;
const ownShopProfile = ({ owner, suspended }: Logins, actor: Actor) =>
  `/api/members/${actor === 'suspended' ? suspended : owner}/shop-profile`;
const SHOP_PROFILE = {
  kerf: 3,
  edgeTrim: 0,
  sheets: [{ length: 2440, width: 1220 }],
  barLengths: [2400],
  solidAllowance: { length: 25, width: 6, thickness: 3 },
  currency: 'EUR',
  prices: [],
};
const onTarget =
  (suffix: string) =>
  ({ target }: Logins) =>
    `/api/admin/members/${target}${suffix}`;

/** The plans of the member a row is about: the suspended member's own, everyone else the owner's. */
const plansOf = ({ plans }: Logins, actor: Actor) => (actor === 'suspended' ? plans.suspended : plans.owner);
const onPlan =
  (pick: (plans: MatrixPlans) => string, suffix = '') =>
  (logins: Logins, actor: Actor) =>
    `/api/plans/${pick(plansOf(logins, actor))}${suffix}`;
const onDraft = (suffix: (draft: MatrixPlans['draft']) => string) => (logins: Logins, actor: Actor) => {
  const { draft } = plansOf(logins, actor);
  return `/api/plans/${draft.slug}/revisions/1${suffix(draft)}`;
};
const published = (plans: MatrixPlans) => plans.published.slug;
/** A review decision on the owner's plan kept for the deciding actor (the others are refused before anything changes). */
const deciding =
  (pick: (review: ReviewMatrixPlans) => { moderator: string; admin: string }, decision: string) =>
  ({ review }: Logins, actor: Actor) =>
    `/api/plans/${pick(review)[actor === 'admin' ? 'admin' : 'moderator']}/revisions/1/${decision}`;

const TABLE: Record<string, Row> = {
  'GET /api/health': { path: fixed('/api/health'), expect: everyone(200) },
  'GET /api/docs': { path: fixed('/api/docs'), expect: everyone(200) },
  'GET /api/docs-json': { path: fixed('/api/docs-json'), expect: everyone(200) },
  'GET /api/docs-yaml': { path: fixed('/api/docs-yaml'), expect: everyone(200) },
  'GET /api/auth/github': { path: fixed('/api/auth/github'), expect: everyone(302) },
  // Without the provider's code and state: back to the sign-in page with an error, for anyone.
  'GET /api/auth/github/callback': { path: fixed('/api/auth/github/callback'), expect: everyone(302) },
  'POST /api/auth/refresh': { path: fixed('/api/auth/refresh'), expect: signedIn(204) },
  'POST /api/auth/sign-out': { path: fixed('/api/auth/sign-out'), expect: everyone(204), freshSession: true },
  'GET /api/me': { path: fixed('/api/me'), expect: signedIn(200) },
  'GET /api/members/:login': { path: ({ owner }) => `/api/members/${owner}`, expect: everyone(200) },
  'GET /api/members/:login/settings': { path: ownSettings, expect: ownersOnly(200, 200) },
  'PATCH /api/members/:login/settings': { path: ownSettings, body: { units: 'in' }, expect: ownersOnly(200, 403) },
  'GET /api/members/:login/shop-profile': { path: ownShopProfile, expect: ownersOnly(200, 200) },
  'PUT /api/members/:login/shop-profile': { path: ownShopProfile, body: SHOP_PROFILE, expect: ownersOnly(200, 403) },
  'GET /api/admin/members': { path: fixed('/api/admin/members'), expect: adminsOnly(200) },
  'POST /api/admin/members/:login/moderator': { path: onTarget('/moderator'), expect: adminsOnly(200) },
  'DELETE /api/admin/members/:login/moderator': { path: onTarget('/moderator'), expect: adminsOnly(200) },
  'POST /api/admin/members/:login/suspension': { path: onTarget('/suspension'), expect: adminsOnly(200) },
  'DELETE /api/admin/members/:login/suspension': { path: onTarget('/suspension'), expect: adminsOnly(200) },
  'GET /api/admin/audit': { path: fixed('/api/admin/audit'), expect: adminsOnly(200) },
  'GET /api/plans': { path: fixed('/api/plans'), expect: everyone(200) },
  'POST /api/plans': { path: fixed('/api/plans'), body: PLAN, expect: signedIn(201, { suspended: 403 }) },
  'GET /api/me/plans': { path: fixed('/api/me/plans'), expect: signedIn(200) },
  'GET /api/plans/:slug': { path: onPlan(published), expect: everyone(200) },
  'PATCH /api/plans/:slug': {
    path: onPlan(published),
    body: (logins, actor) => ({
      expectedUpdatedAt: plansOf(logins, actor).published.updatedAt,
      summary: 'A summary changed by the matrix.',
    }),
    expect: ownersOnly(200, 403),
  },
  'POST /api/plans/:slug/revisions': {
    path: onPlan((plans) => plans.readyForNext, '/revisions'),
    expect: ownersOnly(201, 403),
  },
  'GET /api/plans/:slug/revisions/:number': { path: onPlan(published, '/revisions/1'), expect: everyone(200) },
  'PATCH /api/plans/:slug/revisions/:number': {
    path: onDraft(() => ''),
    body: (logins, actor) => ({
      expectedUpdatedAt: plansOf(logins, actor).draft.updatedAt,
      notes: 'Saved by the matrix.',
    }),
    expect: ownersOnly(200, 403),
  },
  'DELETE /api/plans/:slug/revisions/:number': {
    path: onPlan((plans) => plans.secondDraft, '/revisions/2'),
    expect: ownersOnly(204, 403),
  },
  'POST /api/plans/:slug/revisions/:number/submit': {
    path: onPlan((plans) => plans.submittable, '/revisions/1/submit'),
    expect: ownersOnly(200, 403),
  },
  'POST /api/plans/:slug/revisions/:number/withdraw': {
    path: onPlan((plans) => plans.submitted, '/revisions/1/withdraw'),
    expect: ownersOnly(200, 403),
  },
  'PATCH /api/plans/:slug/revisions/:number/parts/:partId': {
    path: onDraft((draft) => `/parts/${draft.partId}`),
    body: (logins, actor) => ({ expectedUpdatedAt: plansOf(logins, actor).draft.partUpdatedAt, material: 'oak' }),
    expect: ownersOnly(200, 403),
  },
  'POST /api/plans/:slug/revisions/:number/drawings': {
    path: onDraft(() => '/drawings'),
    file: { bytes: Buffer.concat([SLED_DXF, Buffer.from('999\nmatrix copy\n')]), name: 'sled-matrix.dxf' },
    expect: ownersOnly(201, 403),
  },
  'PATCH /api/plans/:slug/revisions/:number/drawings/:drawingId': {
    path: onDraft((draft) => `/drawings/${draft.unitlessDrawingId}`),
    body: { units: 'in' },
    expect: ownersOnly(200, 403),
  },
  'DELETE /api/plans/:slug/revisions/:number/drawings/:drawingId': {
    path: onDraft((draft) => `/drawings/${draft.drawingToDelete}`),
    expect: ownersOnly(204, 403),
  },
  'POST /api/plans/:slug/revisions/:number/attachments': {
    path: onDraft(() => '/attachments'),
    file: { bytes: Buffer.from('// matrix\n'), name: 'matrix.ino' },
    expect: ownersOnly(201, 403),
  },
  'DELETE /api/plans/:slug/revisions/:number/attachments/:attachmentId': {
    path: onDraft((draft) => `/attachments/${draft.attachmentId}`),
    expect: ownersOnly(204, 403),
  },
  'GET /api/review/revisions': { path: fixed('/api/review/revisions'), expect: moderatorsOnly(200) },
  'GET /api/review/revisions/:slug/:number': {
    path: ({ review }) => `/api/review/revisions/${review.publish.moderator}/1`,
    expect: moderatorsOnly(200),
  },
  'POST /api/plans/:slug/revisions/:number/publish': {
    path: deciding((review) => review.publish, 'publish'),
    expect: moderatorsOnly(200),
  },
  'POST /api/plans/:slug/revisions/:number/send-back': {
    path: deciding((review) => review.sendBack, 'send-back'),
    body: { notes: 'Sent back by the matrix.' },
    expect: moderatorsOnly(200),
  },
  'POST /api/plans/:slug/revisions/:number/decline': {
    path: deciding((review) => review.decline, 'decline'),
    body: { notes: 'Declined by the matrix.' },
    expect: moderatorsOnly(200),
  },
  'POST /api/plans/:slug/revisions/:number/hide': {
    path: deciding((review) => review.hide, 'hide'),
    body: { reason: 'Hidden by the matrix.' },
    expect: moderatorsOnly(200),
  },
  'POST /api/plans/:slug/revisions/:number/unhide': {
    path: deciding((review) => review.unhide, 'unhide'),
    expect: moderatorsOnly(200),
  },
  'GET /api/plans/:slug/revisions/:number/decisions': {
    path: onPlan(published, '/revisions/1/decisions'),
    expect: signedIn(403, { owner: 200, moderator: 200, admin: 200, suspended: 200 }),
  },
  'GET /api/plans/:slug/revisions/:number/attachments/:attachmentId': {
    path: (logins, actor) => {
      const { published } = plansOf(logins, actor);
      return `/api/plans/${published.slug}/revisions/1/attachments/${published.attachmentId}`;
    },
    expect: everyone(200),
  },
};

/** What `SwaggerModule.setup` serves besides the controllers (src/setup-app.ts). */
const DOCUMENT_ROUTES = ['GET /api/docs', 'GET /api/docs-json', 'GET /api/docs-yaml'];

const joinPath = (...parts: string[]) =>
  `/${parts
    .flatMap((part) => part.split('/'))
    .filter(Boolean)
    .join('/')}`;

/** Every route of every controller Nest has mounted, as "METHOD /api/path", read from Nest's own metadata. */
function routesOf(app: INestApplication): string[] {
  const discovery = new DiscoveryService(app.get(ModulesContainer));
  const scanner = new MetadataScanner();
  const routes = discovery.getControllers().flatMap(({ metatype, instance }) => {
    if (!metatype || !instance) return [];
    const base = Reflect.getMetadata(PATH_METADATA, metatype) as string;
    const prototype = Object.getPrototypeOf(instance) as Record<string, () => unknown>;
    return scanner.getAllMethodNames(prototype).flatMap((name) => {
      const handler = prototype[name]!;
      const path = Reflect.getMetadata(PATH_METADATA, handler) as string | undefined;
      const method = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
      return path === undefined || method === undefined
        ? []
        : [`${RequestMethod[method]} ${joinPath('api', base, path)}`];
    });
  });
  return [...routes, ...DOCUMENT_ROUTES];
}

describe('the authorisation matrix (e2e, MariaDB and the local fakes)', () => {
  let app: INestApplication<App>;
  let server: App;
  const jars = new Map<Actor, CookieJar>();
  const loginOf = new Map<Actor, string>();
  let logins: Logins;

  async function signIn(actor: Actor): Promise<CookieJar> {
    return actor === 'anonymous' ? new CookieJar() : signInAs(server, loginOf.get(actor)!);
  }

  beforeAll(async () => {
    app = await createTestApp();
    server = app.getHttpServer();
    const [owner, other, suspended, target] = await Promise.all(
      ['owner', 'other', 'suspended', 'target'].map((prefix) => createProviderAccount(`matrix-${prefix}`)),
    );
    loginOf.set('member', 'demo-builder');
    loginOf.set('owner', owner!.login);
    loginOf.set('other', other!.login);
    loginOf.set('moderator', 'demo-moderator');
    loginOf.set('admin', 'demo-admin');
    loginOf.set('suspended', suspended!.login);

    const admin = await signInAs(server, 'demo-admin');
    for (const login of ['demo-moderator', suspended!.login, target!.login]) await signInAs(server, login);
    const asAdmin = (path: string) => request(server).post(path).set(CSRF).set('Cookie', admin.header());
    await asAdmin('/api/admin/members/demo-moderator/moderator').expect(200);
    await asAdmin(`/api/admin/members/${suspended!.login}/suspension`).expect(200);
    for (const actor of ACTORS) jars.set(actor, await signIn(actor));
    logins = {
      owner: owner!.login,
      suspended: suspended!.login,
      target: target!.login,
      plans: {
        owner: await createMatrixPlans(app, owner!.login),
        suspended: await createMatrixPlans(app, suspended!.login),
      },
      review: await createReviewMatrixPlans(app, owner!.login),
    };
  });

  afterAll(async () => {
    await app.close();
  });

  it('has a row for every route the app serves, and no row for a route it does not', () => {
    const routes = routesOf(app);
    expect(routes).toEqual(expect.arrayContaining(['GET /api/me', 'PATCH /api/members/:login/settings']));
    expect(routes.filter((route) => !(route in TABLE))).toEqual([]);
    expect(Object.keys(TABLE).filter((route) => !routes.includes(route))).toEqual([]);
  });

  it('documents every API route in the OpenAPI document', async () => {
    const document = (await request(server).get('/api/docs-json').expect(200)).body as {
      paths: Record<string, Record<string, unknown>>;
    };
    const documented = Object.entries(document.paths).flatMap(([path, operations]) =>
      Object.keys(operations).map((method) => `${method.toUpperCase()} ${path.replace(/\{(\w+)\}/g, ':$1')}`),
    );
    const undocumented = routesOf(app).filter(
      (route) => !DOCUMENT_ROUTES.includes(route) && !documented.includes(route),
    );
    expect(undocumented).toEqual([]);
  });

  it.each(Object.entries(TABLE))('%s', async (route, row) => {
    const method = route.split(' ')[0]!.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
    const actual = {} as Statuses;
    for (const actor of ACTORS) {
      const jar = row.freshSession ? await signIn(actor) : jars.get(actor)!;
      let call = request(server)[method](row.path(logins, actor)).set(CSRF);
      if (jar.header()) call = call.set('Cookie', jar.header());
      const body = typeof row.body === 'function' ? row.body(logins, actor) : row.body;
      if (row.file) call = call.attach('file', row.file.bytes, row.file.name);
      const response = await (body ? call.send(body) : call);
      jar.take(response);
      actual[actor] = response.status;
    }
    expect(actual).toEqual(row.expect);
  });
});
