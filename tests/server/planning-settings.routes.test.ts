import { describe, expect } from 'vitest';
import { actualWasteSchema, planningSettingsSchema } from '@shared/schemas/forecast';
import { addBinAs, blindRivetBin, patch, post } from '../helpers/crib';
import { addAssembly, drawFrom, hundredRivetLine, screwBin, setAssemblyStatus } from '../helpers/planning-fixture';
import { crewTest } from '../helpers/crew-test';

describe('/api/settings/planning', () => {
  crewTest('shows everyone the defaults and lets only a chapter lead change them', async ({ lead, qm, member }) => {
    const read = await member.agent.get('/api/settings/planning');
    expect(read.status).toBe(200);
    expect(planningSettingsSchema.parse(read.body)).toEqual({ wastePercent: 5, maxPitchDiameters: 10, serviceLevel: 0.95, orderCost: 15, holdingRate: 0.25 });

    for (const who of [member, qm]) {
      const refused = await patch(who, '/api/settings/planning', { wastePercent: 8 });
      expect(refused.status).toBe(403);
      expect(refused.body.error.code).toBe('FORBIDDEN');
    }
    const changed = await patch(lead, '/api/settings/planning', { wastePercent: 4.5, serviceLevel: 0.9 });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ wastePercent: 4.5, serviceLevel: 0.9, orderCost: 15 });
    expect((await member.agent.get('/api/settings/planning')).body.wastePercent).toBe(4.5);
  });

  crewTest('refuses settings out of range, unknown or missing, in words', async ({ lead }) => {
    const cases: [unknown, string][] = [
      [{}, 'Send at least one setting to change.'],
      [{ serviceLevel: 1 }, 'The service level is below 100 %, like 0.95.'],
      [{ wastePercent: -1 }, 'Waste is at least 0 %.'],
      [{ holdingRate: 0 }, 'The holding rate is at least 1 % a year.'],
      [{ leadTime: 3 }, 'leadTime'],
    ];
    for (const [body, words] of cases) {
      const res = await patch(lead, '/api/settings/planning', body);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.message).toContain(words);
    }
    expect((await lead.agent.get('/api/settings/planning')).body.serviceLevel).toBe(0.95);
  });

  crewTest('feeds the forecast: a 90 % service level gives z = 1.2816', async ({ lead, qm }) => {
    await addBinAs(qm, blindRivetBin());
    // Exact inverse normal at 90 %: 1.2816 (tables round to 1.28; trade-checks §6).
    await patch(lead, '/api/settings/planning', { serviceLevel: 0.9 });
    const res = await qm.agent.get('/api/forecast');
    expect(res.body.meta.serviceLevel).toBe(0.9);
    expect(res.body.data[0].z).toBeCloseTo(1.2816, 4);
  });
});

describe('GET /api/waste', () => {
  crewTest('compares drawn with estimated on finished assemblies, per member and for the chapter', async ({ lead, qm, member }) => {
    const shelf = await addBinAs(qm, blindRivetBin({ initialQuantity: 1000 }));
    const spare = await addBinAs(qm, blindRivetBin({ initialQuantity: 1000, location: 'Shelf B1' }));
    const screws = await addBinAs(qm, screwBin());
    // Mia's rib bay: 100 rivets estimated (the 6/32 line has no bin, so it is left out), screws are not rivets.
    const unstocked = { ...hundredRivetLine, holesPerRow: 30, rivet: { ...hundredRivetLine.rivet, diameter32: 6 } };
    const bay = await addAssembly(member, { name: 'Rib bay', status: 'in_progress', lines: [hundredRivetLine, unstocked], extraItems: [{ binCode: screws.code, quantity: 10 }] });
    await drawFrom(member, shelf.code, 70, bay);
    await drawFrom(member, spare.code, 40, bay);
    expect((await post(member, `/api/bins/${shelf.code}/return`, { quantity: 3, assemblyId: bay })).status).toBe(201);
    const slip = await drawFrom(member, shelf.code, 20, bay);
    expect((await post(qm, `/api/bins/${shelf.code}/ledger/${slip}/reverse`, { note: 'drew for the wrong assembly' })).status).toBe(201);
    await drawFrom(member, shelf.code, 5);
    await drawFrom(member, screws.code, 12, bay);
    await setAssemblyStatus(member, bay, 'done');
    // Lee's lid: 100 estimated, 102 drawn. A planned assembly with draws does not count yet.
    const lid = await addAssembly(lead, { name: 'Lid', lines: [hundredRivetLine] });
    await drawFrom(lead, shelf.code, 102, lid);
    await setAssemblyStatus(lead, lid, 'done');
    const later = await addAssembly(member, { name: 'Flap', lines: [hundredRivetLine] });
    await drawFrom(member, shelf.code, 30, later);

    const res = await qm.agent.get('/api/waste');
    expect(res.status).toBe(200);
    const waste = actualWasteSchema.parse(res.body);
    // Mia: 70 + 40 − 3 = 107 against 100 → 7 %; Lee: 102 → 2 %; chapter 209 / 200 → 4.5 %.
    expect(waste.members).toEqual([
      { member: { id: expect.any(Number), name: 'Lee Lead' }, estimated: 100, drawn: 102, wastePercent: 2 },
      { member: { id: expect.any(Number), name: 'Mia Member' }, estimated: 100, drawn: 107, wastePercent: 7 },
    ]);
    expect(waste.chapter).toEqual({ estimated: 200, drawn: 209, wastePercent: 4.5 });
    expect(waste.currentAllowance).toBe(5);

    // Offered as the new allowance, the lead takes it.
    await patch(lead, '/api/settings/planning', { wastePercent: waste.chapter.wastePercent });
    expect((await lead.agent.get('/api/waste')).body.currentAllowance).toBe(4.5);
  });

  crewTest('has no figure before any assembly is done, and is not for members', async ({ lead, member }) => {
    const res = await lead.agent.get('/api/waste');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ chapter: { estimated: 0, drawn: 0, wastePercent: null }, members: [], currentAllowance: 5 });
    const refused = await member.agent.get('/api/waste');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
  });
});
