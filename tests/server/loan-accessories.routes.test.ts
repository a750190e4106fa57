import { describe, expect } from 'vitest';
import { serviceDueListSchema } from '@shared/schemas/overdue';
import { addToolAs, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';

const NOSEPIECES = ['Nosepiece 3/32', 'Nosepiece 1/8', 'Nosepiece 5/32'];

const test = crewTest
  /** A hand rivet puller with three nosepieces, added by the quartermaster. */
  .extend('code', async ({ qm }) => (await addToolAs(qm, { name: 'Hand rivet puller', category: 'hand_rivet_puller', accessories: NOSEPIECES })).code)
  .extend('myLoans', ({ member }) => async () => (await member.agent.get('/api/loans/mine')).body.data as { tool: { code: string }; accessoriesOut: string[] | null }[]);

describe('what goes out with a loan', () => {
  test('records the accessories ticked at checkout, and My loans shows those, not every accessory', async ({ member, code, myLoans }) => {
    const out = await post(member, `/api/tools/${code}/checkout`, { accessories: ['Nosepiece 1/8'] });
    expect(out.status).toBe(201);
    expect(out.body.accessories).toEqual(['Nosepiece 1/8']);
    expect((await myLoans()).find((l) => l.tool.code === code)?.accessoriesOut).toEqual(['Nosepiece 1/8']);
    expect((await member.agent.get(`/api/tools/${code}`)).body.loan.accessoriesOut).toEqual(['Nosepiece 1/8']);
  });

  test('refuses an accessory the tool does not have, naming it', async ({ member, code }) => {
    const res = await post(member, `/api/tools/${code}/checkout`, { accessories: ['Nosepiece 1/8', 'Nosepiece 1/4'] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('UNKNOWN_ACCESSORY');
    expect(res.body.error.issues).toEqual([{ path: 'accessories.1', message: `${code} has no accessory called "Nosepiece 1/4". It has: ${NOSEPIECES.join(', ')}.` }]);
    expect((await member.agent.get(`/api/tools/${code}`)).body.status).toBe('available');
  });
});

describe('what comes back', () => {
  test('asks for what went out at return, and records what did not come back', async ({ t, qm, member, code }) => {
    await post(member, `/api/tools/${code}/checkout`, { accessories: ['Nosepiece 1/8', 'Nosepiece 5/32'] }).expect(201);
    const unchecked = await post(member, `/api/tools/${code}/return`, { condition: 'ok' });
    expect(unchecked.status).toBe(400);
    expect(unchecked.body.error).toMatchObject({ code: 'ACCESSORIES_UNCHECKED', message: `Tick what came back with ${code}: Nosepiece 1/8, Nosepiece 5/32 went out with it.` });
    const stray = await post(member, `/api/tools/${code}/return`, { condition: 'ok', accessoriesBack: ['Nosepiece 3/32'] });
    expect(stray.body.error.code).toBe('UNKNOWN_ACCESSORY');

    const back = await post(member, `/api/tools/${code}/return`, { condition: 'ok', accessoriesBack: ['Nosepiece 1/8'] });
    expect(back.status).toBe(200);
    expect(back.body).toMatchObject({ status: 'available', accessoriesMissing: ['Nosepiece 5/32'] });

    const tool = (await member.agent.get(`/api/tools/${code}`)).body;
    expect(tool.missingAccessories).toEqual([{ accessory: 'Nosepiece 5/32', reportedAt: t.clock.now.toISOString(), lastHolder: { id: expect.any(Number), name: 'Mia Member' } }]);
    const history = (await member.agent.get(`/api/tools/${code}/events`)).body.data as { action: string; detail: string }[];
    expect(history[0]).toMatchObject({ action: 'returned', detail: 'Came back ok; did not come back: Nosepiece 5/32' });

    const service = serviceDueListSchema.parse((await qm.agent.get('/api/service-due')).body);
    expect(service.data).toEqual([expect.objectContaining({ code, urgency: 'accessory_missing', missingAccessories: ['Nosepiece 5/32'], words: 'Missing: Nosepiece 5/32 (not back from Mia Member)' })]);
  });

  test('keeps a missing accessory off the next checkout until the quartermaster marks it found or replaced', async ({ qm, member, code }) => {
    await post(member, `/api/tools/${code}/checkout`, { accessories: ['Nosepiece 5/32'] }).expect(201);
    await post(member, `/api/tools/${code}/return`, { condition: 'ok', accessoriesBack: [] }).expect(200);
    const again = await post(member, `/api/tools/${code}/checkout`, { accessories: ['Nosepiece 5/32'] });
    expect(again.status).toBe(400);
    expect(again.body.error.issues[0].message).toMatch(/Nosepiece 5\/32 is missing/);

    expect((await post(member, `/api/tools/${code}/missing-accessories/resolve`, { accessory: 'Nosepiece 5/32', resolution: 'found' })).status).toBe(403);
    const wrong = await post(qm, `/api/tools/${code}/missing-accessories/resolve`, { accessory: 'Nosepiece 1/8', resolution: 'found' });
    expect(wrong.status).toBe(404);
    expect(wrong.body.error.code).toBe('ACCESSORY_NOT_MISSING');
    const found = await post(qm, `/api/tools/${code}/missing-accessories/resolve`, { accessory: 'Nosepiece 5/32', resolution: 'replaced' });
    expect(found.status).toBe(200);
    expect(found.body.data).toEqual([]);
    expect((await qm.agent.get('/api/service-due')).body.data).toEqual([]);
    expect((await member.agent.get(`/api/tools/${code}`)).body.missingAccessories).toEqual([]);
    expect((await post(member, `/api/tools/${code}/checkout`, { accessories: ['Nosepiece 5/32'] })).status).toBe(201);
  });

  test('needs nothing ticked back for a loan that recorded nothing going out (older loans, tools without accessories)', async ({ member, code }) => {
    await post(member, `/api/tools/${code}/checkout`).expect(201);
    expect((await post(member, `/api/tools/${code}/return`, { condition: 'ok' })).status).toBe(200);
  });

  test('takes a queued offline checkout with its accessories, replayed once', async ({ t, member, code }) => {
    const send = () =>
      member.agent
        .post(`/api/tools/${code}/checkout`)
        .set('X-CSRF-Token', member.csrf)
        .set('Idempotency-Key', 'offline-checkout-0001')
        .set('X-Performed-At', new Date(t.clock.now.getTime() - 60_000).toISOString())
        .send({ accessories: ['Nosepiece 3/32'] });
    expect((await send()).status).toBe(201);
    const replay = await send();
    expect(replay.headers['idempotent-replayed']).toBe('true');
    expect((await member.agent.get(`/api/tools/${code}`)).body.loan.accessoriesOut).toEqual(['Nosepiece 3/32']);
    const copy = (await member.agent.get('/api/offline/catalogue')).body.tools as { code: string; accessoriesOut: string[] | null }[];
    expect(copy.find((c) => c.code === code)?.accessoriesOut).toEqual(['Nosepiece 3/32']);
  });
});
