import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { KitItem } from '@shared/schemas/builds';
import type { CatalogueTool } from '@shared/schemas/offline';
import type { ToolForYou } from '@shared/schemas/tools';
import type { ToolCategory } from '@shared/tools/categories';
import { OfflineCheckoutForm } from '@/features/offline/components/offline-checkout-form';
import type { StoredCatalogue } from '@/features/offline/db';
import { KitList } from '@/features/planning/components/kit-list';
import { CheckoutForm } from '@/features/tools/components/checkout-form';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const AIR = 'Air tools and compressed air';
const GUN = 'Rivet gun';
const HEARING = 'Hearing protection';
const EYES = 'Eye protection';
const DRILLING = 'Drilling';

const tool = (category: ToolCategory, name: string): ToolForYou => ({
  id: 40,
  code: 'T-0040',
  name,
  category,
  location: 'Air tool shelf',
  replacementValueCents: 32_000,
  loanDays: 7,
  loanDaysOverride: null,
  requiredSignoff: null,
  serviceIntervalDays: null,
  lastServiceAt: null,
  serviceDueAt: null,
  status: 'available',
  statusNote: null,
  drillSize: null,
  rivetDiameter32: null,
  traySize: null,
  trayCapacity: null,
  accessories: [],
  notes: '',
  loan: null,
  missingAccessories: [],
  holds: { waiting: 0, offeredTo: null, offerExpiresAt: null },
  photoIds: [],
  forYou: { actions: ['check_out'], reason: null, defaultDueAt: '2026-12-10T05:59:59.999Z', yourHold: null },
});

/** The caution box's item titles, or none when no box shows. */
function cautionTitles(): string[] {
  const box = screen.queryByText('Caution: tools that can hurt');
  if (!box) return [];
  return [...box.parentElement!.querySelectorAll('li strong')].map((s) => s.textContent.replace(/:$/, ''));
}

/** True when the caution box comes before the element in the page. */
const before = (a: Element, b: Element) => (a.compareDocumentPosition(b) & Node.DOCUMENT_POSITION_FOLLOWING) !== 0;

afterEach(() => vi.unstubAllGlobals());

describe('cautions at the checkout of a tool that can hurt', () => {
  it('shows a rivet gun’s trigger, air, eye and hearing cautions before the Check out button, with the closing line', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<CheckoutForm tool={tool('rivet_gun', 'Rivet gun, 3X')} />);
    expect(cautionTitles()).toEqual([AIR, GUN, EYES, HEARING]);
    expect(screen.getByText(/never pull the trigger unless the set is on the rivet and the bucking bar is held behind it/i)).toBeTruthy();
    expect(screen.getByText(/never point an air line or an air tool at skin/i)).toBeTruthy();
    expect(screen.getByText(/tool maker’s instructions govern/)).toBeTruthy();
    expect(before(screen.getByText('Caution: tools that can hurt'), screen.getByRole('button', { name: 'Check out T-0040' }))).toBe(true);
  });

  it('shows a bucking bar none of the air cautions', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<CheckoutForm tool={tool('bucking_bar', 'Bucking bar, tungsten')} />);
    const titles = cautionTitles();
    expect(titles).not.toContain(AIR);
    expect(screen.queryByText(/disconnect the air/i)).toBeNull();
    expect(titles).toContain(GUN);
  });

  it('shows no caution box for a hand rivet puller', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<CheckoutForm tool={tool('hand_rivet_puller', 'Hand rivet puller')} />);
    expect(screen.queryByText('Caution: tools that can hurt')).toBeNull();
  });

  it('shows the same cautions on the scan sheet that checks out from the phone’s offline copy', () => {
    const offline = { code: 'T-0041', name: 'Air drill', category: 'air_drill', loanDays: 7, accessories: [] } as unknown as CatalogueTool;
    renderWithProviders(<OfflineCheckoutForm copy={{} as StoredCatalogue} tool={offline} />);
    expect(cautionTitles()).toEqual([DRILLING, AIR, EYES, HEARING]);
    expect(before(screen.getByText('Caution: tools that can hurt'), screen.getByRole('button', { name: 'Check out T-0041' }))).toBe(true);
  });
});

describe('cautions on the crib kit', () => {
  const item = (role: KitItem['role'], need: string, category: ToolCategory | null): KitItem => ({
    role,
    need,
    count: null,
    tool: category ? { code: `T-00${need.length}`, name: need, status: 'available', category } : null,
    note: category ? null : 'none in the crib',
  });

  it('shows the drilling cautions once for a kit that holds drill bits, and none of the air ones without air tools', () => {
    renderWithProviders(<KitList kit={[item('puller', 'Rivet puller', 'hand_rivet_puller'), item('drill_bit', 'Drill bit #40', 'drill_bit'), item('drill_bit', 'Drill bit #30', 'drill_bit'), item('deburring_tool', 'Deburring tool', 'deburring_tool')]} />);
    expect(screen.getAllByText('Caution: tools that can hurt')).toHaveLength(1);
    expect(cautionTitles()).toEqual([DRILLING, EYES]);
    expect(screen.getByText(/deburr both sides of every hole/i)).toBeTruthy();
  });

  it('adds the air, trigger and hearing cautions when the kit picks a rivet gun', () => {
    renderWithProviders(<KitList kit={[item('rivet_gun', 'Rivet gun', 'rivet_gun'), item('bucking_bar', 'Bucking bar', 'bucking_bar'), item('drill_bit', 'Drill bit #30', 'drill_bit')]} />);
    expect(cautionTitles()).toEqual([DRILLING, AIR, GUN, EYES, HEARING]);
  });

  it('cautions about the cutter’s drilling and the dies closing on fingers for a flush kit, picked or not', () => {
    renderWithProviders(<KitList kit={[item('countersink_cutter', '100° countersink cutter, 1/8 in, #30 pilot', 'countersink_cutter'), item('dimple_dies', '100° dimple dies, 3/32 in', null)]} />);
    expect(cautionTitles()).toEqual([DRILLING, 'Dimple dies', EYES]);
    expect(screen.getByText(/fingers clear of the dies/i)).toBeTruthy();
  });

  it('cautions about the work a kit item needs even when the crib has no such tool', () => {
    renderWithProviders(<KitList kit={[item('drill_bit', 'Drill bit #21', null)]} />);
    const list = screen.getByRole('list', { name: 'Cautions' });
    expect(within(list).getByText(`${DRILLING}:`)).toBeTruthy();
  });
});
