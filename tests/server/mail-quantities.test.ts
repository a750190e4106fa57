import { describe, expect, it } from 'vitest';
import type { Alert } from '@shared/schemas/forecast';
import { alertDigestMail } from '../../server/features/planning/alert-digest';
import { plural, valueWords } from '../../server/mail/messages';

const calendar = { zone: 'America/Chicago', now: new Date('2026-12-01T15:00:00Z') };

const alert = (over: Partial<Alert>): Alert => ({
  id: 1,
  state: 'ordered',
  bin: {
    code: 'B-0042',
    designation: 'Sealant, two-part polysulfide',
    kind: 'sealant_primer',
    supplier: 'Coatings supply',
    supplierPart: 'PS-6',
    packSize: 1000,
    unit: 'tube',
    unitCost: 42.5,
    onHand: 1206,
    leadTimeDays: 21,
  },
  raisedAt: '2026-11-20T15:00:00Z',
  reason: 'At or below the reorder point.',
  onHandAtRaise: 1206,
  reorderPoint: 1500,
  safetyStock: 400,
  suggestedQty: 2000,
  toOrder: 2000,
  orderedAt: '2026-11-24T15:00:00Z',
  orderedBy: { id: 1, name: 'Quinn Quartermaster' },
  orderedQty: 3000,
  receivedQty: 0,
  onOrder: 3000,
  expectedAt: '2026-12-09',
  closedAt: null,
  dismissedAt: null,
  dismissReason: null,
  ...over,
});

describe('quantities in the mails', () => {
  it('write counts and money with thousands separators', () => {
    expect(plural(1206, 'pack', 'packs')).toBe('1,206 packs');
    expect(valueWords(120_600)).toBe('$1,206.00');
  });

  it('name the unit in the plural for many, as the pages do', () => {
    const { text } = alertDigestMail('qm@example.org', 'Quinn', [alert({}), alert({ id: 2, bin: { ...alert({}).bin, code: 'B-0043', onHand: 1 }, state: 'open', orderedAt: null, orderedQty: null, onOrder: 0, expectedAt: null })], 'http://gripline.test', calendar);
    expect(text).toContain('B-0042 Sealant, two-part polysulfide, part PS-6: 1,206 tubes on hand; ordered 3,000 tubes on');
    expect(text).toContain('3,000 tubes still to come');
    expect(text).toContain('order another 2,000 tubes (2 packs of 1,000, about $85,000.00)');
    expect(text).toContain('B-0043 Sealant, two-part polysulfide, part PS-6: 1 tube on hand; order 2,000 tubes');
  });
});
