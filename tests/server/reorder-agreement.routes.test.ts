import { describe, expect } from 'vitest';
import { binReorderSchema, binSchema, restockListSchema } from '@shared/schemas/bins';
import { forecastListSchema, purchaseListSchema } from '@shared/schemas/forecast';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { addAssembly, hundredRivetLine, screwBin } from '../helpers/planning-fixture';
import { crewTest } from '../helpers/crew-test';

const fatLine = { ...hundredRivetLine, rivet: { ...hundredRivetLine.rivet, diameter32: 5 } };

type Line = { code: string; quantity: number; costCents: number };
const byCode = (a: Line, b: Line) => a.code.localeCompare(b.code);

// Tuesday 2026-12-01 12:00 UTC (the test clock): week 0 runs Monday 2026-11-30 to Sunday 2026-12-06.
const test = crewTest
  /**
   * The situation found in use, in small: a bin whose own reorder quantity is smaller than what the
   * forecast asks for, a bin the plans empty though its typed reorder point is 0, and a bin only its
   * typed reorder point calls low.
   */
  .extend('disagreeingBins', ({ qm, member }) => async () => {
    const dome = await addBinAs(qm, blindRivetBin({ initialQuantity: 100, leadTimeDays: 14, reorderPoint: 150, reorderQty: 200 }));
    await addAssembly(member, { name: 'Rib bay', plannedStart: '2026-12-01', plannedFinish: '2026-12-06', lines: [hundredRivetLine] });
    const fat = await addBinAs(qm, blindRivetBin({ diameter32: 5, initialQuantity: 100, leadTimeDays: 14, reorderPoint: 0 }));
    await addAssembly(member, { name: 'Spar web', plannedStart: '2026-12-01', plannedFinish: '2026-12-06', lines: [fatLine] });
    const screws = await addBinAs(qm, screwBin({ reorderPoint: 300, reorderQty: 100 }));
    return { dome, fat, screws };
  })
  .extend('restockLines', ({ qm }) => async (): Promise<Line[]> => {
    const res = await qm.agent.get('/api/bins/restock');
    expect(res.status).toBe(200);
    return restockListSchema
      .parse(res.body)
      .data.map((i) => ({ code: i.code, quantity: i.toOrder, costCents: i.orderCostCents }))
      .sort(byCode);
  })
  .extend('purchaseLines', ({ qm }) => async (): Promise<Line[]> => {
    const res = await qm.agent.get('/api/alerts/purchase-list');
    expect(res.status).toBe(200);
    return purchaseListSchema
      .parse(res.body)
      .data.flatMap((g) => g.lines.map((l) => ({ code: l.bin.code, quantity: l.quantity, costCents: l.costCents })))
      .sort(byCode);
  });

describe('one reorder rule', () => {
  test('Restock and the purchase list list the same bins with the same quantities and costs', async ({ qm, member, disagreeingBins, restockLines, purchaseLines }) => {
    const { dome, fat, screws } = await disagreeingBins();
    expect((await post(qm, '/api/alerts/refresh')).status).toBe(200);

    const restock = await restockLines();
    const purchase = await purchaseLines();
    expect(restock.map((l) => l.code)).toEqual([dome.code, fat.code, screws.code]);
    expect(purchase).toEqual(restock);

    // The bin page, the bins list and the forecast say the same quantity for each bin.
    const list = (await qm.agent.get('/api/bins?pageSize=500')).body.data.map((b: unknown) => binSchema.parse(b));
    for (const line of restock) {
      const reorder = binReorderSchema.parse((await member.agent.get(`/api/bins/${line.code}/reorder`)).body);
      expect({ code: line.code, low: reorder.low, toOrder: reorder.toOrder, cost: reorder.orderCostCents }).toEqual({ code: line.code, low: true, toOrder: line.quantity, cost: line.costCents });
      expect(list.find((b: { code: string }) => b.code === line.code)).toMatchObject({ low: true, toOrder: line.quantity });
    }
    const forecast = forecastListSchema.parse((await qm.agent.get('/api/forecast')).body).data;
    expect(forecast.filter((f) => f.needsAlert).map((f) => ({ code: f.bin.code, quantity: f.suggestedOrder })).sort((a, b) => a.code.localeCompare(b.code))).toEqual(
      restock.map(({ code, quantity }) => ({ code, quantity })),
    );
  });

  test('agrees without a refresh: the purchase list answers from the same computation at the same moment', async ({ disagreeingBins, restockLines, purchaseLines }) => {
    await disagreeingBins();
    expect(await purchaseLines()).toEqual(await restockLines());
  });

  test('keeps a bin whose alert was dismissed off every list alike: Restock, the purchase list, the forecast and the bin page', async ({ qm, disagreeingBins, restockLines, purchaseLines }) => {
    const { dome } = await disagreeingBins();
    const alerts = (await post(qm, '/api/alerts/refresh')).body.data as { id: number; bin: { code: string } }[];
    const domeAlert = alerts.find((a) => a.bin.code === dome.code)!;
    expect((await post(qm, `/api/alerts/${domeAlert.id}/dismiss`, { reason: 'The kit ships with a bag of these' })).status).toBe(200);

    const restock = await restockLines();
    expect(restock.map((l) => l.code)).not.toContain(dome.code);
    expect(await purchaseLines()).toEqual(restock);
    const forecast = forecastListSchema.parse((await qm.agent.get(`/api/forecast?bins=${dome.code}`)).body).data[0]!;
    expect(forecast.suggestedOrder).toBe(0);
    expect((await qm.agent.get(`/api/bins/${dome.code}/reorder`)).body).toMatchObject({ toOrder: 0, orderCostCents: 0 });
  });
});
