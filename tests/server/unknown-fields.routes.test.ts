import { describe, expect } from 'vitest';
import { addBinAs, addToolAs, blindRivetBin, lend, patch, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import { PASSWORD, type SignedInAgent } from '../helpers/test-app';

let binCode: string;
let buildId: number;
let assemblyId: number;
let loanId: number;

const rivet = { kind: 'blind-structural', head: 'dome', diameter32: 4 };
const line = { label: 'Spar flange', length: 20, pitch: 1, edgeDistance: 0.375, stack: [0.032, 0.032], rivet };

type Who = 'anonymous' | 'member' | 'qm' | 'lead';
interface Case {
  route: string;
  who: Who;
  method: 'post' | 'patch';
  path: () => string;
  body: () => object;
  /** The unknown field's path in the issue. */
  field: string;
}

const cases: Case[] = [
  { route: 'POST /api/tools', who: 'qm', method: 'post', path: () => '/api/tools', body: () => ({ name: 'Rivet gun', category: 'other', loanDay: 7 }), field: 'loanDay' },
  { route: 'PATCH /api/tools/:code', who: 'qm', method: 'patch', path: () => '/api/tools/T-0001', body: () => ({ loanDay: 14 }), field: 'loanDay' },
  { route: 'POST /api/tools/:code/out-of-service', who: 'qm', method: 'post', path: () => '/api/tools/T-0001/out-of-service', body: () => ({ note: 'Worn jaws', reason: 'x' }), field: 'reason' },
  { route: 'POST /api/tools/:code/back-in-service', who: 'qm', method: 'post', path: () => '/api/tools/T-0001/back-in-service', body: () => ({ note: 'Fixed', servicd: true }), field: 'servicd' },
  { route: 'POST /api/tools/:code/holds', who: 'lead', method: 'post', path: () => '/api/tools/T-0002/holds', body: () => ({ until: '2027-01-01' }), field: 'until' },
  { route: 'POST /api/tools/:code/checkout', who: 'lead', method: 'post', path: () => '/api/tools/T-0001/checkout', body: () => ({ dueDate: '2027-01-01' }), field: 'dueDate' },
  { route: 'POST /api/bins', who: 'qm', method: 'post', path: () => '/api/bins', body: () => blindRivetBin({ grip16: 3, reorderPt: 50 }), field: 'reorderPt' },
  { route: 'PATCH /api/bins/:code', who: 'qm', method: 'patch', path: () => `/api/bins/${binCode}`, body: () => ({ reorderPt: 50 }), field: 'reorderPt' },
  { route: 'POST /api/builds/:id/assemblies', who: 'member', method: 'post', path: () => `/api/builds/${buildId}/assemblies`, body: () => ({ name: 'Flap', unit: 'in', plannedStrat: '2027-02-01' }), field: 'plannedStrat' },
  { route: 'PATCH /api/assemblies/:id', who: 'member', method: 'patch', path: () => `/api/assemblies/${assemblyId}`, body: () => ({ plannedStrat: '2027-02-01' }), field: 'plannedStrat' },
  { route: 'PATCH /api/assemblies/:id (a line)', who: 'member', method: 'patch', path: () => `/api/assemblies/${assemblyId}`, body: () => ({ lines: [{ ...line, lable: 'Skin' }] }), field: 'lines.0.lable' },
  {
    route: 'PATCH /api/assemblies/:id (a line’s rivet)',
    who: 'member',
    method: 'patch',
    path: () => `/api/assemblies/${assemblyId}`,
    body: () => ({ lines: [line, { ...line, rivet: { ...rivet, colour: 'red' } }] }),
    field: 'lines.1.rivet.colour',
  },
  { route: 'PATCH /api/assemblies/:id (an extra item)', who: 'member', method: 'patch', path: () => `/api/assemblies/${assemblyId}`, body: () => ({ extraItems: [{ binCode, quantity: 2, qty: 3 }] }), field: 'extraItems.0.qty' },
  { route: 'POST /api/assemblies/:id/kit/holds', who: 'member', method: 'post', path: () => `/api/assemblies/${assemblyId}/kit/holds`, body: () => ({ whenever: true }), field: 'whenever' },
  { route: 'POST /api/estimate', who: 'member', method: 'post', path: () => '/api/estimate', body: () => ({ unit: 'in', lines: [{ ...line, label: 'Spar' }] }), field: 'lines.0.label' },
  { route: 'PATCH /api/settings/crib', who: 'lead', method: 'patch', path: () => '/api/settings/crib', body: () => ({ holdHours: 24, holdDays: 2 }), field: 'holdDays' },
  { route: 'PATCH /api/settings/planning', who: 'lead', method: 'patch', path: () => '/api/settings/planning', body: () => ({ wastePercent: 4, serviceLvl: 0.9 }), field: 'serviceLvl' },
  { route: 'POST /api/alerts/refresh', who: 'qm', method: 'post', path: () => '/api/alerts/refresh', body: () => ({ force: true }), field: 'force' },
  { route: 'POST /api/overdue/:loanId/remind', who: 'lead', method: 'post', path: () => `/api/overdue/${loanId}/remind`, body: () => ({ text: 'Bring it back' }), field: 'text' },
  { route: 'POST /api/invitations', who: 'lead', method: 'post', path: () => '/api/invitations', body: () => ({ email: 'new@example.org', role: 'member', nmae: 'New' }), field: 'nmae' },
  { route: 'POST /api/mail/:id/retry', who: 'lead', method: 'post', path: () => '/api/mail/1/retry', body: () => ({ force: true }), field: 'force' },
  { route: 'POST /api/auth/logout', who: 'member', method: 'post', path: () => '/api/auth/logout', body: () => ({ everywhere: true }), field: 'everywhere' },
  { route: 'POST /api/auth/login', who: 'anonymous', method: 'post', path: () => '/api/auth/login', body: () => ({ email: 'lead@example.org', password: PASSWORD, rememberMe: true }), field: 'rememberMe' },
  { route: 'POST /api/auth/password-reset', who: 'anonymous', method: 'post', path: () => '/api/auth/password-reset', body: () => ({ email: 'lead@example.org', mail: 'x' }), field: 'mail' },
];

/**
 * A mistyped field (loanDay for loanDays) must never be dropped without a word: every route that
 * reads a body refuses a field it does not know, at any depth, and names it.
 */
const test = crewTest
  .extend('agentFor', ({ t, lead, qm, member }) => async (who: Who): Promise<SignedInAgent> => {
    return who === 'anonymous' ? t.anonymous() : { member, qm, lead }[who];
  });

test.beforeEach(async ({ qm, member, t }) => {
  await addToolAs(qm, { name: 'Pneumatic rivet puller', category: 'other', loanDays: 7 });
  await addToolAs(qm, { name: 'Air drill', category: 'other' });
  binCode = (await addBinAs(qm, blindRivetBin())).code;
  buildId = (await post(member, '/api/builds', { name: 'Two-seat kit' })).body.id as number;
  assemblyId = (await post(member, `/api/builds/${buildId}/assemblies`, { name: 'Rudder', unit: 'in', lines: [line] })).body.id as number;
  loanId = await lend(t, member, 'T-0002', 3 * 24 * 3600_000);
});

describe('an unknown field in a request body', () => {
  test.for(cases)('$route answers 400 VALIDATION_FAILED naming $field', async ({ who, method, path, body, field }, { agentFor }) => {
    const as = await agentFor(who);
    const res = await (method === 'post' ? post(as, path(), body()) : patch(as, path(), body()));
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    const name = field.split('.').pop()!;
    expect(res.body.error.issues).toContainEqual({ path: field, message: `Unknown field "${name}".` });
    expect(res.body.error.message).toContain(`Unknown field "${name}".`);
  });

  test('changes nothing: a mistyped loanDay leaves the loan period as it was', async ({ qm }) => {
    expect((await patch(qm, '/api/tools/T-0001', { loanDay: 14 })).status).toBe(400);
    expect((await qm.agent.get('/api/tools/T-0001')).body.loanDays).toBe(7);
    expect((await post(qm, '/api/tools', { name: 'Rivet gun', category: 'other', loanDay: 7 })).status).toBe(400);
    expect((await qm.agent.get('/api/tools')).body.meta.total).toBe(2);
  });

  test('names every unknown field together with the other problems', async ({ qm }) => {
    const res = await patch(qm, '/api/tools/T-0001', { loanDay: 14, locaton: 'Shelf 3', name: '' });
    expect(res.status).toBe(400);
    const paths = (res.body.error.issues as Array<{ path: string }>).map((i) => i.path).sort();
    expect(paths).toEqual(['loanDay', 'locaton', 'name']);
  });

  test('still takes the same bodies without the unknown field', async ({ t, lead, qm, member }) => {
    expect((await patch(qm, '/api/tools/T-0001', { loanDays: 14 })).status).toBe(200);
    expect((await patch(member, `/api/assemblies/${assemblyId}`, { lines: [line], extraItems: [{ binCode, quantity: 2 }] })).status).toBe(200);
    const { label: _label, ...estimateLine } = line;
    expect((await post(member, '/api/estimate', { unit: 'in', lines: [estimateLine] })).status).toBe(200);
    t.clock.now = new Date(t.clock.now.getTime() + 5 * 24 * 3600_000);
    expect((await post(lead, `/api/overdue/${loanId}/remind`)).status).toBe(201);
    expect((await post(qm, '/api/alerts/refresh')).status).toBe(200);
  });
});
