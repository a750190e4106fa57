import { describe, expect, it } from 'vitest';
import { stationMayRequest } from '../../server/features/stations/station-scope';

describe('the station allow-list', () => {
  it.each([
    ['GET', '/auth/me'],
    ['GET', '/tools/T-0042'],
    ['POST', '/tools/T-0042/checkout'],
    ['POST', '/tools/T-0042/return'],
    ['DELETE', '/tools/T-0042/holds/mine'],
    ['GET', '/bins/B-0107'],
    ['POST', '/bins/B-0107/draw'],
    ['POST', '/bins/B-0107/return'],
    ['GET', '/assemblies'],
    ['GET', '/photos/12/thumbnail'],
  ])('lets %s %s through', (method, path) => {
    expect(stationMayRequest(method, path)).toBe(true);
  });

  it.each([
    ['GET', '/users'],
    ['GET', '/tools'],
    ['GET', '/bins/export.csv'],
    ['GET', '/bins/restock'],
    ['GET', '/bins/ledger.csv'],
    ['POST', '/bins/B-0107/receive'],
    ['POST', '/tools/T-0042/retire'],
    ['PATCH', '/tools/T-0042'],
    ['GET', '/tools/T-0042/checkout'],
    ['DELETE', '/tools/T-0042/holds/7'],
    ['POST', '/stations'],
    ['GET', '/assemblies/3'],
    ['GET', '/photos/abc'],
  ])('refuses %s %s', (method, path) => {
    expect(stationMayRequest(method, path)).toBe(false);
  });
});
