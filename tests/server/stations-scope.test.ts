import { describe, expect, it } from 'vitest';
import { replayMayRequest, stationMayRequest } from '../../server/features/stations/station-scope';

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
    ['GET', '/station/copy'],
    ['POST', '/station/replay-sign-in'],
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

describe('the replay allow-list', () => {
  it.each([
    ['POST', '/tools/T-0042/checkout'],
    ['POST', '/tools/T-0042/return'],
    ['POST', '/bins/B-0107/draw'],
    ['POST', '/bins/B-0107/return'],
  ])('lets the queued %s %s through with both queue headers only', (method, path) => {
    expect(replayMayRequest(method, path, true)).toBe(true);
    expect(replayMayRequest(method, path, false)).toBe(false);
  });

  it.each([
    ['GET', '/auth/me'],
    ['GET', '/auth/csrf'],
    ['POST', '/station/done'],
    ['POST', '/station/replay-sign-in'],
  ])('lets %s %s through without them', (method, path) => {
    expect(replayMayRequest(method, path, false)).toBe(true);
  });

  it.each([
    ['GET', '/tools/T-0042'],
    ['GET', '/station/session'],
    ['GET', '/station/copy'],
    ['POST', '/station/sign-in'],
    ['POST', '/tools/T-0042/holds'],
    ['DELETE', '/tools/T-0042/holds/mine'],
    ['POST', '/tools/T-0042/photos'],
    ['GET', '/users'],
    ['POST', '/bins/B-0107/receive'],
    ['GET', '/tools/T-0042/checkout'],
  ])('refuses %s %s even with the queue headers', (method, path) => {
    expect(replayMayRequest(method, path, true)).toBe(false);
  });
});
