import type { CreateBinBody } from '@shared/schemas/bins';
import { seededRandom } from '@shared/random/seeded';
import { createBinBodySchema } from '@shared/schemas/bins';
import type { RivetHead } from '@shared/stock/kinds';
import { findUserByEmail } from '../accounts/users.repo';
import type { ServiceContext } from '../context';
import type { Database } from '../db/client';
import type { UserRow } from '../db/schema/users';
import { insertNewBin } from '../features/stock/bins.service';
import { count, draw, receive, returnUnused, writeOff } from '../features/stock/ledger.service';
import { addChapterDays, startOfChapterDay } from '@shared/time/chapter-time';
import { DAY_MS, MINUTE_MS } from '@shared/time/durations';
import { readChapterTimeZone } from '../settings/chapter-time-zone';

/** The history starts this many days before today: six months. */
const HISTORY_DAYS = 183;

// Invented suppliers: no real company is meant.
const FASTENERS = 'Larkhaven Fastener Supply';
const HARDWARE = 'Tamarack Bend Aero Hardware';
const CUTTERS = 'Quillmere Cutting Tools';
const COATINGS = 'Foxglove Sealants & Coatings';

interface DemoBin {
  key: string;
  bin: CreateBinBody;
  /** The unit cost on the bin's first reorder (suppliers change prices). */
  repricedTo?: number;
}

/** Fields beyond the usual for one bin, and its price change. */
type More = Partial<CreateBinBody> & Pick<DemoBin, 'repricedTo'>;

/** Pack size, reorder point, reorder quantity, opening stock. */
type Stocking = [packSize: number, reorderPoint: number, reorderQty: number, opening: number];
const stocking = ([packSize, reorderPoint, reorderQty, initialQuantity]: Stocking) => ({ packSize, reorderPoint, reorderQty, initialQuantity });
const HEAD_LETTER: Record<RivetHead, string> = { dome: 'D', countersunk: 'C', flange: 'F' };

function blind(key: string, general: boolean, d32: number, head: RivetHead, grip: number, material: string, stem: string, unitCost: number, stock: Stocking, more: More = {}): DemoBin {
  const { repricedTo, ...extra } = more;
  const drawer = { 3: 1, 4: head === 'dome' ? 2 : 3, 5: 4, 6: 5 }[d32] ?? 6;
  const bin = {
    kind: general ? 'blind_general' : 'blind_structural',
    head,
    material,
    stemMaterial: stem,
    diameter32: d32,
    grip16: grip,
    unitCost,
    ...stocking(stock),
    supplier: general ? HARDWARE : FASTENERS,
    supplierPart: `${general ? 'TBH-GP' : 'LFS-BS'}${d32}${HEAD_LETTER[head]}${grip}-${material.slice(0, 2).toUpperCase()}${stem.slice(0, 1).toUpperCase()}`,
    leadTimeDays: general ? 14 : 9,
    location: `Rivet cabinet, drawer ${material === '5056' && !general ? drawer : 6}`,
    ...extra,
  } as CreateBinBody;
  return { key, bin, repricedTo };
}

function solid(key: string, head: RivetHead, material: string, d32: number, length16: number, unitCost: number, stock: Stocking, more: More = {}): DemoBin {
  const { repricedTo, ...extra } = more;
  const bin = {
    kind: 'solid_rivet',
    head,
    material,
    diameter32: d32,
    length16,
    unitCost,
    ...stocking(stock),
    supplier: FASTENERS,
    supplierPart: `LFS-SR${head === 'dome' ? 470 : 426}-${material.replace('-T4', '')}-${d32}-${length16}`,
    leadTimeDays: 9,
    location: `Solid rivet cabinet, drawer ${d32 === 3 ? 1 : 2}`,
    ...extra,
  } as CreateBinBody;
  return { key, bin, repricedTo };
}

function item(key: string, kind: CreateBinBody['kind'], name: string, unit: string, unitCost: number, stock: Stocking, supplier: string, supplierPart: string, leadTimeDays: number, location: string, more: More = {}): DemoBin {
  const { repricedTo, ...extra } = more;
  return { key, bin: { kind, name, unit, unitCost, ...stocking(stock), supplier, supplierPart, leadTimeDays, location, ...extra }, repricedTo };
}

const drillBit = (size: string, unitCost: number, stock: Stocking, more: More = {}) =>
  item(`drill${size.slice(1)}`, 'drill_bit', `Drill bit ${size}, jobber, cobalt`, 'each', unitCost, stock, CUTTERS, `QCT-J${size.slice(1)}-CO`, 12, 'Drill bit drawer', { drillSize: size, ...more });
const hardware = (key: string, kind: CreateBinBody['kind'], name: string, unitCost: number, stock: Stocking, part: string, more: More = {}) =>
  item(key, kind, name, 'each', unitCost, stock, HARDWARE, part, 14, 'Hardware cabinet, drawer 2', more);

const PLASTICS = 'For fibreglass fairings and plastic parts only: never in a structural line.';

/** The invented chapter's bins: about forty, in the sizes a sheet-metal shop keeps. */
const DEMO_BINS: DemoBin[] = [
  blind('b3d1', false, 3, 'dome', 1, '5056', 'steel', 0.085, [250, 150, 500, 500]),
  blind('b3d2', false, 3, 'dome', 2, '5056', 'steel', 0.088, [250, 150, 500, 500]),
  blind('b4d1', false, 4, 'dome', 1, '5056', 'steel', 0.11, [500, 200, 500, 600]),
  blind('b4d2', false, 4, 'dome', 2, '5056', 'steel', 0.115, [500, 400, 1000, 1400], { leadTimeDays: 14 }),
  blind('b4d3', false, 4, 'dome', 3, '5056', 'steel', 0.12, [500, 400, 500, 700]),
  blind('b4d4', false, 4, 'dome', 4, '5056', 'steel', 0.125, [250, 100, 250, 300]),
  blind('b4c1', false, 4, 'countersunk', 1, '5056', 'steel', 0.13, [250, 150, 500, 500]),
  blind('b4c2', false, 4, 'countersunk', 2, '5056', 'steel', 0.13, [250, 150, 500, 500]),
  blind('b5d2', false, 5, 'dome', 2, '5056', 'steel', 0.165, [250, 150, 500, 400]),
  blind('b5d3', false, 5, 'dome', 3, '5056', 'stainless', 0.19, [250, 100, 250, 300]),
  blind('b5d4', false, 5, 'dome', 4, '5056', 'steel', 0.17, [250, 100, 250, 250]),
  blind('b5d6', false, 5, 'dome', 6, '5056', 'steel', 0.18, [100, 50, 100, 150]),
  blind('b5c2', false, 5, 'countersunk', 2, '5056', 'steel', 0.175, [250, 100, 250, 250]),
  blind('b6d4', false, 6, 'dome', 4, '5056', 'steel', 0.24, [100, 50, 200, 200], { holeDrill: '#11' }),
  blind('b6d8', false, 6, 'dome', 8, '5056', 'steel', 0.28, [100, 25, 100, 100], { holeDrill: '#11' }),
  blind('b4s2', false, 4, 'dome', 2, 'stainless', 'stainless', 0.31, [100, 50, 100, 150], { notes: 'Firewall and hot-area attachments.' }),
  blind('b4m3', false, 4, 'dome', 3, 'monel', 'stainless', 0.35, [100, 25, 100, 100], { notes: 'For stainless steel parts.' }),
  blind('g4d2', true, 4, 'dome', 2, 'aluminium', 'aluminium', 0.045, [500, 100, 500, 500], { notes: PLASTICS }),
  blind('g4f3', true, 4, 'flange', 3, 'aluminium', 'steel', 0.06, [250, 50, 250, 250], { notes: `Large flange spreads the load on acrylic and polycarbonate. ${PLASTICS}` }),
  solid('s470ad4_4', 'dome', '2117-T4', 4, 4, 0.018, [1000, 300, 1000, 1500], { repricedTo: 0.0195 }),
  solid('s470ad4_5', 'dome', '2117-T4', 4, 5, 0.019, [1000, 400, 1000, 1500], { repricedTo: 0.0205 }),
  solid('s470ad4_6', 'dome', '2117-T4', 4, 6, 0.021, [500, 200, 500, 800]),
  solid('s470ad3_4', 'dome', '2117-T4', 3, 4, 0.013, [1000, 300, 1000, 1200]),
  solid('s426ad3_35', 'countersunk', '2117-T4', 3, 3.5, 0.014, [1000, 350, 1000, 1500]),
  solid('s426ad3_4', 'countersunk', '2117-T4', 3, 4, 0.015, [1000, 300, 1000, 1000]),
  solid('s470b4_5', 'dome', '5056', 4, 5, 0.035, [250, 50, 250, 250], { notes: 'For magnesium parts.', location: 'Solid rivet cabinet, drawer 3' }),
  hardware('screw6pan', 'screw', 'Screw #6-32 × 1/2 pan head, stainless', 0.14, [100, 50, 100, 200], 'TBH-S632-08P'),
  hardware('screw8pan', 'screw', 'Screw #8-32 × 1/2 pan head, stainless', 0.18, [100, 80, 200, 200], 'TBH-S832-08P'),
  hardware('screw6flat', 'screw', 'Screw #6-32 × 3/8 100° flat head, stainless', 0.16, [100, 50, 100, 200], 'TBH-S632-06F'),
  hardware('screw8flat', 'screw', 'Screw #8-32 × 5/8 100° flat head, stainless', 0.22, [100, 50, 100, 200], 'TBH-S832-10F'),
  hardware('nutplate8', 'nut', 'Nutplate #8-32, two-lug, self-locking', 1.15, [25, 20, 50, 75], 'TBH-NP832-2L'),
  hardware('locknut8', 'nut', 'Self-locking nut #8-32, nylon insert', 0.14, [100, 50, 100, 200], 'TBH-LN832-NY'),
  hardware('washer8', 'washer', 'Washer #8, flat, stainless', 0.045, [100, 50, 200, 300], 'TBH-W8-SS'),
  drillBit('#40', 2.35, [12, 8, 24, 24], { repricedTo: 2.6 }),
  drillBit('#30', 2.6, [12, 6, 12, 24]),
  drillBit('#21', 3.1, [6, 3, 6, 12]),
  drillBit('#20', 3.1, [6, 3, 6, 12]),
  drillBit('#11', 3.85, [6, 2, 6, 6]),
  item('blades', 'deburring_blade', 'Deburring blades, swivel, high-speed steel', 'each', 1.2, [10, 5, 20, 30], CUTTERS, 'QCT-DB-E100', 12, 'Cabinet A, drawer 3'),
  item('sealant', 'sealant_primer', 'Sealant, two-part polysulfide, 6 oz tube', 'tube', 42.5, [1, 1, 2, 4], COATINGS, 'FSC-PS-6OZ', 21, 'Flammables cabinet', {
    repricedTo: 46.8,
    notes: 'Store cool; check the shelf-life date before use. Gloves and ventilation.',
  }),
  item('primer', 'sealant_primer', 'Self-etching primer, 12 oz spray can', 'can', 16.75, [6, 3, 6, 6], COATINGS, 'FSC-SEP-12', 10, 'Flammables cabinet', { notes: 'Spray outdoors or in the booth, with a respirator.' }),
];

/** Who builds what: each project draws from its bins over its days (days before today, first to last). */
interface Project {
  who: string;
  note: string;
  from: number;
  to: number;
  /** Bin key and the usual quantity drawn in one session. */
  uses: [string, number][];
  /** Unused stock of this bin goes back at the end. */
  returns?: string;
}

const MARCO = 'member@example.org';
const INES = 'ines.parra@example.org';
const TOMASZ = 'tomasz.wren@example.org';
const KELECHI = 'kelechi.obi@example.org';
const DANA = 'lead@example.org';
const RUTH = 'quartermaster@example.org';

const PROJECTS: Project[] = [
  { who: MARCO, note: 'Left aileron skins', from: 176, to: 141, uses: [['b4d2', 70], ['b4d3', 35], ['drill40', 1], ['drill30', 1], ['blades', 1]], returns: 'b4d2' },
  { who: MARCO, note: 'Right aileron skins', from: 136, to: 100, uses: [['b4d2', 70], ['b4d3', 35], ['drill40', 1], ['drill30', 1]] },
  { who: MARCO, note: 'Flap brackets', from: 96, to: 62, uses: [['b5d2', 30], ['b5d4', 20], ['drill40', 1], ['drill20', 1]] },
  { who: MARCO, note: 'Left flap skins', from: 56, to: 4, uses: [['b4d2', 80], ['b4d3', 50], ['b4c1', 30], ['drill40', 1], ['drill30', 1], ['blades', 1]] },
  { who: INES, note: 'Tool chest lid', from: 172, to: 146, uses: [['b3d1', 40], ['b3d2', 30], ['screw6pan', 8], ['washer8', 8]] },
  { who: INES, note: 'Tool chest drawers', from: 145, to: 96, uses: [['b3d2', 45], ['b4d1', 40], ['screw6flat', 10], ['nutplate8', 4], ['drill40', 1]], returns: 'b4d1' },
  { who: INES, note: 'Trailer fender skins', from: 82, to: 35, uses: [['b5d2', 40], ['b5c2', 30], ['b4c2', 25], ['drill20', 1], ['primer', 1]] },
  { who: TOMASZ, note: 'Horizontal stabiliser ribs', from: 180, to: 120, uses: [['s470ad4_4', 120], ['s470ad4_5', 140], ['s426ad3_35', 80], ['drill30', 1], ['primer', 1]], returns: 's470ad4_4' },
  { who: TOMASZ, note: 'Elevator skins', from: 115, to: 58, uses: [['s426ad3_35', 150], ['s426ad3_4', 100], ['s470ad4_5', 110], ['drill40', 1]] },
  { who: TOMASZ, note: 'Elevator trim tab', from: 50, to: 5, uses: [['s470ad4_5', 120], ['s470ad4_6', 60], ['s470ad3_4', 80], ['s426ad3_4', 60], ['drill40', 1], ['drill30', 1]] },
  { who: KELECHI, note: 'Wingtip fairings', from: 162, to: 120, uses: [['g4d2', 40], ['g4f3', 20], ['screw8pan', 10], ['nutplate8', 6], ['locknut8', 8]], returns: 'g4d2' },
  { who: KELECHI, note: 'Fuel tank end ribs', from: 110, to: 62, uses: [['s470ad4_4', 100], ['s426ad3_4', 60], ['sealant', 1], ['drill30', 1], ['blades', 1]] },
  { who: KELECHI, note: 'Canopy frame', from: 55, to: 3, uses: [['g4f3', 20], ['screw8pan', 14], ['screw8flat', 10], ['locknut8', 10], ['washer8', 20]] },
  { who: DANA, note: 'Firewall recess', from: 100, to: 70, uses: [['b4s2', 25], ['b4m3', 10], ['screw8pan', 8], ['washer8', 10], ['sealant', 1]], returns: 'b4s2' },
  { who: DANA, note: 'Spar carry-through doubler', from: 66, to: 20, uses: [['b6d4', 20], ['b6d8', 8], ['b5d6', 15], ['b5d3', 25], ['drill30', 1], ['drill21', 1], ['drill11', 1]] },
  { who: RUTH, note: 'Open-day demonstration panel', from: 32, to: 26, uses: [['b4d2', 40], ['s470ad4_4', 60], ['b4d4', 20], ['drill40', 1]] },
  // Work going on now: yesterday's practice session, so this month's spend shows what the bench is using.
  { who: MARCO, note: 'Practice panel for the flap hinge', from: 1, to: 1, uses: [['b4d2', 60], ['b4d3', 30], ['drill40', 1]] },
];

type Planned =
  | { at: Date; type: 'draw'; who: string; key: string; quantity: number; note: string }
  /** Gives back a share of the member's last draw from the bin. */
  | { at: Date; type: 'return'; who: string; key: string; share: number; note: string }
  | { at: Date; type: 'count'; key: string; short: number; note: string }
  | { at: Date; type: 'write_off'; key: string; quantity: number; note: string };

/** Builders' sessions every few days across each project, with what they drew. */
function plan(dayAt: (daysAgo: number, hour: number) => Date): Planned[] {
  const events: Planned[] = [];
  for (const [i, p] of PROJECTS.entries()) {
    // One generator per project: changing one project leaves the others' history as it was.
    const random = seededRandom(417 + i);
    let lastDay = p.from;
    for (let day = p.from; day >= p.to; day -= 4 + Math.floor(random() * 5)) {
      const at = dayAt(day, 9 + random() * 11);
      for (const [key, usual] of p.uses) {
        const single = usual === 1;
        if (random() > (single ? 0.3 : 0.6)) continue;
        const quantity = single ? 1 : Math.max(5, Math.round(usual * (0.6 + random() * 0.8)));
        events.push({ at, type: 'draw', who: p.who, key, quantity, note: p.note });
      }
      lastDay = day;
    }
    if (p.returns) events.push({ at: dayAt(lastDay - 1, 17.5), type: 'return', who: p.who, key: p.returns, share: 0.2 + random() * 0.3, note: `Left over from ${p.note.toLowerCase()}` });
  }
  events.push({ at: dayAt(61, 10.25), type: 'count', key: 's426ad3_35', short: 40, note: 'Shelf count: a bag had split behind the drawer' });
  events.push({ at: dayAt(44, 11), type: 'write_off', key: 'sealant', quantity: 1, note: 'Past its shelf-life date; skinned over in the tube' });
  events.push({ at: dayAt(5, 15.5), type: 'write_off', key: 'primer', quantity: 1, note: 'Can dented at the seam and leaking; not safe to spray' });
  return events.sort((a, b) => a.at.getTime() - b.at.getTime());
}

export interface DemoStockSummary {
  bins: number;
  entries: number;
}

/**
 * Seeds the invented chapter's bins through the same services the quartermaster and members use,
 * with six months of history: draws for members' projects, a few returns, one write-off, one count,
 * and a receipt of the reorder quantity each time a bin falls to its reorder point, arriving after
 * the supplier's lead time. Bins that fell in the last days are still waiting, so the Restock list
 * has something to show. Deterministic: fixed tables and seeded generators, dates relative to now.
 */
export function seedDemoStock(db: Database, now: Date = new Date()): DemoStockSummary {
  let clock = now;
  const ctx: ServiceContext = { db, publicUrl: 'http://localhost', now: () => clock };
  const zone = readChapterTimeZone(db);
  const today = startOfChapterDay(now, zone);
  const dayAt = (daysAgo: number, hour: number) => new Date(addChapterDays(today, -daysAgo, zone).getTime() + Math.round(hour * 60) * MINUTE_MS);
  const people = new Map<string, UserRow>();
  const person = (email: string): UserRow => people.get(email) ?? people.set(email, findUserByEmail(db, email)!).get(email)!;
  const quartermaster = person(RUTH);
  const random = seededRandom(4170);

  const codes = new Map<string, string>();
  const onHand = new Map<string, number>();
  const spec = new Map(DEMO_BINS.map((b) => [b.key, { ...b, parsed: createBinBodySchema.parse(b.bin) }]));
  /** Each member's last draw from each bin: a return gives back part of it. */
  const lastDraw = new Map<string, number>();
  const pending = new Map<string, Date>();
  const repriced = new Set<string>();
  let orderNo = 3100;
  let entries = 0;

  const placeOrderIfLow = (key: string, at: Date) => {
    const { parsed: bin } = spec.get(key)!;
    if (onHand.get(key)! > bin.reorderPoint || pending.has(key)) return;
    pending.set(key, new Date(at.getTime() + (bin.leadTimeDays + Math.floor(random() * 3)) * DAY_MS));
  };

  const receiveDue = (until: Date) => {
    for (const [key, arrives] of [...pending].sort((a, b) => a[1].getTime() - b[1].getTime())) {
      if (arrives > until) continue;
      const { parsed: bin, repricedTo } = spec.get(key)!;
      const packs = Math.max(1, Math.ceil(bin.reorderQty / bin.packSize));
      const unitCost = repricedTo !== undefined && !repriced.has(key) ? repricedTo : undefined;
      if (unitCost !== undefined) repriced.add(key);
      clock = arrives;
      const m = receive(ctx, quartermaster, codes.get(key)!, { quantity: packs * bin.packSize, unitCost, note: `Order ${orderNo++} from ${bin.supplier}` });
      onHand.set(key, m.balanceAfter);
      pending.delete(key);
      entries++;
    }
  };

  db.$client.transaction(() => {
    clock = dayAt(HISTORY_DAYS, 9);
    for (const demo of spec.values()) {
      const bin = insertNewBin(ctx, quartermaster, demo.parsed);
      codes.set(demo.key, bin.code);
      onHand.set(demo.key, bin.onHand);
      if (bin.onHand > 0) entries++;
    }

    for (const e of plan(dayAt)) {
      receiveDue(e.at);
      clock = e.at;
      const code = codes.get(e.key)!;
      const have = onHand.get(e.key)!;
      if (e.type === 'draw' || e.type === 'return') {
        const who = person(e.who);
        const tab = `${e.who} ${e.key}`;
        const quantity = e.type === 'draw' ? Math.min(e.quantity, have) : Math.round((lastDraw.get(tab) ?? 0) * e.share);
        if (quantity <= 0) continue;
        const m = e.type === 'draw' ? draw(ctx, who, code, { quantity, note: e.note }) : returnUnused(ctx, who, code, { quantity, note: e.note });
        onHand.set(e.key, m.balanceAfter);
        if (e.type === 'draw') lastDraw.set(tab, quantity);
      } else if (e.type === 'count') {
        onHand.set(e.key, count(ctx, quartermaster, code, { counted: Math.max(0, have - e.short), note: e.note }).balanceAfter);
      } else {
        if (have < e.quantity) continue;
        onHand.set(e.key, writeOff(ctx, quartermaster, code, { quantity: e.quantity, note: e.note }).balanceAfter);
      }
      entries++;
      placeOrderIfLow(e.key, e.at);
    }
    receiveDue(dayAt(1, 23));
  })();

  return { bins: DEMO_BINS.length, entries };
}
