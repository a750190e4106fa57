import { describe, expect } from 'vitest';
import { accountsTest } from '../helpers/crew-test';
import { PASSWORD, type SignedInAgent } from '../helpers/test-app';

/** Nothing of a stack trace or of the database's own wording reaches the client. */
function expectNoInternals(body: unknown) {
  const text = JSON.stringify(body);
  expect(text).not.toMatch(/stack/i);
  expect(text).not.toMatch(/\bat \S+ \(|\.ts:\d+|\.js:\d+/);
  expect(text).not.toMatch(/sqlite|no such table|users/i);
}

const test = accountsTest.extend('agentFor', ({ t }) => async (as: As): Promise<SignedInAgent> => (as === 'lead' ? t.signIn('lead@example.org') : t.anonymous()));

describe('unknown API paths', () => {
  test.for(['/api/nope', '/api/auth/nope', '/api/health/nope', '/api/auth'])('GET %s answers 404 NOT_FOUND in the JSON envelope', async (path, { t }) => {
    const res = await (await t.anonymous()).agent.get(path);
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body).toEqual({ error: { code: 'NOT_FOUND', message: expect.stringContaining(path) } });
  });

  test('answers 404 NOT_FOUND to a signed-in lead too, for any method that passes the CSRF check', async ({ t }) => {
    const { agent, csrf } = await t.signIn('lead@example.org');
    const res = await agent.delete('/api/nope').set('X-CSRF-Token', csrf);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
    expect(res.body.error.message).toMatch(/DELETE \/api\/nope/);
  });
});

describe('a path with a malformed percent-encoding', () => {
  const expectBadPath = (res: { status: number; headers: Record<string, string>; body: unknown }) => {
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body).toEqual({ error: { code: 'BAD_REQUEST_PATH', message: expect.stringMatching(/percent/) } });
    expectNoInternals(res.body);
  };

  test.for(['/api/tools/%', '/api/bins/%', '/api/users/%', '/api/assemblies/%zz', '/api/tools/%E0%A4%A', '/api/nope/%', '/api/tools/T-1%/photos'])(
    'GET %s answers 400 BAD_REQUEST_PATH to a signed-in lead',
    async (path, { t }) => {
      const { agent } = await t.signIn('lead@example.org');
      expectBadPath(await agent.get(path));
    },
  );

  test.for(['/api/invitations/by-token/abc%', '/api/tools/%', '/api/health/%', '/%', '/tools/%zz'])('GET %s answers 400 BAD_REQUEST_PATH to anyone', async (path, { t }) => {
    const { agent } = await t.anonymous();
    expectBadPath(await agent.get(path));
  });

  test('answers 400 to a POST as well, before its CSRF check', async ({ t }) => {
    const { agent, csrf } = await t.signIn('lead@example.org');
    expectBadPath(await agent.post('/api/tools/%/checkout').set('X-CSRF-Token', csrf).send({}));
  });

  test('reads a well-formed encoding as usual (%2D is a hyphen; %25 is a percent sign the code schema refuses)', async ({ t }) => {
    const { agent } = await t.signIn('lead@example.org');
    const missing = await agent.get('/api/tools/T%2D0042');
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toMatch(/T-0042/);
    const refused = await agent.get('/api/tools/T%25');
    expect(refused.status).toBe(400);
    expect(refused.body.error.code).toBe('VALIDATION_FAILED');
  });
});

describe('unexpected failures', () => {
  test('answers 500 INTERNAL_ERROR without internals when an async handler rejects (sign-in with the users table gone)', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    t.db.$client.exec('drop table users');
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'lead@example.org', password: PASSWORD });
    expect(res.status).toBe(500);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body).toEqual({ error: { code: 'INTERNAL_ERROR', message: expect.any(String) } });
    expectNoInternals(res.body);
  });

  test('answers 500 INTERNAL_ERROR without internals when middleware throws (a signed-in request with the users table gone)', async ({ t }) => {
    const { agent } = await t.signIn('member@example.org');
    t.db.$client.exec('drop table users');
    const res = await agent.get('/api/auth/me');
    expect(res.status).toBe(500);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body).toEqual({ error: { code: 'INTERNAL_ERROR', message: expect.any(String) } });
    expectNoInternals(res.body);
  });

  test('keeps answering normally after a 500', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    t.db.$client.exec('alter table users rename to users_away');
    expect((await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'lead@example.org', password: PASSWORD })).status).toBe(500);
    t.db.$client.exec('alter table users_away rename to users');
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: 'lead@example.org', password: PASSWORD });
    expect(res.status).toBe(200);
  });

  test('answers 413 BODY_TOO_LARGE for a body over 100 kB', async ({ t }) => {
    const { agent, csrf } = await t.anonymous();
    const res = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', csrf)
      .send({ email: 'lead@example.org', password: 'x'.repeat(120_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('BODY_TOO_LARGE');
  });
});

describe('security headers', () => {
  test.for(['/api/health', '/api/nope'])('sets helmet’s headers on %s and hides the framework', async (path, { t }) => {
    const res = await (await t.anonymous()).agent.get(path);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['content-security-policy']).toMatch(/img-src 'self' data: blob:/);
    // WebAssembly only (the station's badge and PIN checks), never eval of script text.
    expect(res.headers['content-security-policy']).toMatch(/script-src 'self' 'wasm-unsafe-eval'(;|$)/);
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  test('sends no Strict-Transport-Security and no upgrade-insecure-requests without secure cookies', async ({ t }) => {
    const res = await (await t.anonymous()).agent.get('/api/health');
    expect(res.headers['strict-transport-security']).toBeUndefined();
    expect(res.headers['content-security-policy']).not.toMatch(/upgrade-insecure-requests/);
  });
});

type As = 'anonymous' | 'lead';
interface BadInputCase {
  route: string;
  as: As;
  method: 'post' | 'patch';
  path: (ids: { member: number }) => string;
  body: unknown;
  paths: string[];
}

const WELL_FORMED_TOKEN = 'T'.repeat(43);

describe('bad input on every mutating route', () => {
  const cases: BadInputCase[] = [
    { route: 'POST /api/auth/login', as: 'anonymous', method: 'post', path: () => '/api/auth/login', body: { email: 42, password: ['x'] }, paths: ['email', 'password'] },
    { route: 'POST /api/auth/password-reset', as: 'anonymous', method: 'post', path: () => '/api/auth/password-reset', body: { address: 'lead@example.org' }, paths: ['address', 'email'] },
    {
      route: 'POST /api/auth/password-reset/confirm',
      as: 'anonymous',
      method: 'post',
      path: () => '/api/auth/password-reset/confirm',
      body: { token: 12345, password: true },
      paths: ['password', 'token'],
    },
    { route: 'POST /api/invitations', as: 'lead', method: 'post', path: () => '/api/invitations', body: { email: ['a@example.org'], role: 'admiral' }, paths: ['email', 'role'] },
    {
      route: 'POST /api/invitations/accept',
      as: 'anonymous',
      method: 'post',
      path: () => '/api/invitations/accept',
      body: { token: WELL_FORMED_TOKEN, name: { first: 'Nia' }, password: 1234567890 },
      paths: ['name', 'password'],
    },
    { route: 'PATCH /api/users/:id', as: 'lead', method: 'patch', path: ({ member }) => `/api/users/${member}`, body: { role: 7, active: 'yes' }, paths: ['active', 'role'] },
  ];

  test.for(cases)('$route answers 400 VALIDATION_FAILED naming each field for a body of the wrong shape', async ({ as, method, path, body, paths }, { t, crew, agentFor }) => {
    const { agent, csrf } = await agentFor(as);
    const res = await agent[method](path({ member: crew.member.id })).set('X-CSRF-Token', csrf).send(body as object);
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.message).toEqual(expect.any(String));
    expect(res.body.error.message.length).toBeGreaterThan(0);
    expect(res.body.error.issues.length).toBeGreaterThan(0);
    for (const issue of res.body.error.issues) expect(issue).toEqual({ path: expect.any(String), message: expect.any(String) });
    expect([...new Set(res.body.error.issues.map((i: { path: string }) => i.path))].sort()).toEqual(paths);
    expect(await t.lastMailTo('lead@example.org')).toBeUndefined();
  });

  test.for(cases)('$route answers 400 VALIDATION_FAILED for a JSON array instead of an object', async ({ as, method, path }, { crew, agentFor }) => {
    const { agent, csrf } = await agentFor(as);
    const res = await agent[method](path({ member: crew.member.id })).set('X-CSRF-Token', csrf).send([1, 2, 3]);
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.message.length).toBeGreaterThan(0);
    expect(res.body.error.issues.length).toBeGreaterThan(0);
  });

  test.for(cases)('$route answers 400 VALIDATION_FAILED for no body at all', async ({ as, method, path }, { crew, agentFor }) => {
    const { agent, csrf } = await agentFor(as);
    const res = await agent[method](path({ member: crew.member.id })).set('X-CSRF-Token', csrf);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.issues.length).toBeGreaterThan(0);
  });

  test.for(cases)('$route answers 400 INVALID_JSON for a body that is not JSON', async ({ as, method, path }, { crew, agentFor }) => {
    const { agent, csrf } = await agentFor(as);
    const res = await agent[method](path({ member: crew.member.id }))
      .set('X-CSRF-Token', csrf)
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('INVALID_JSON');
  });
});
