import { createAssemblyBodySchema, createBuildBodySchema, type AssemblyStatus, type CreateAssemblyBody } from '@shared/schemas/builds';
import { findUserByEmail } from '../accounts/users.repo';
import type { ServiceContext } from '../context';
import type { Database } from '../db/client';
import { findAssembly } from '../features/planning/assemblies.repo';
import { createAssembly } from '../features/planning/assemblies.service';
import { assemblyBill } from '../features/planning/assembly-estimate.service';
import { createBuild } from '../features/planning/builds.service';
import { findBinByCode } from '../features/stock/bins.repo';
import { binCodeNamed, lastEntryAt } from '../features/stock/stock.reads';
import { draw } from '../features/stock/ledger.service';
import { addChapterDays, chapterDay, startOfChapterDay } from '@shared/time/chapter-time';
import { DAY_MS, HOUR_MS, MINUTE_MS } from '@shared/time/durations';
import { readChapterTimeZone } from '../settings/chapter-time-zone';


type Rivet = { kind: 'blind-structural' | 'blind-general' | 'solid'; head: 'dome' | 'countersunk' | 'flange'; diameter32: number; material: string };
const blind = (diameter32: number, head: Rivet['head'] = 'dome'): Rivet => ({ kind: 'blind-structural', head, diameter32, material: '5056' });
const soft: Rivet = { kind: 'blind-general', head: 'flange', diameter32: 4, material: 'aluminium' };
const solid = (diameter32: number, head: Rivet['head'] = 'dome'): Rivet => ({ kind: 'solid', head, diameter32, material: '2117-T4' });

/** A rivet line in inches: label, length, target pitch, rows, sheet stack, rivet. */
const line = (label: string, length: number, pitch: number, rows: number, stack: number[], rivet: Rivet) => ({ label, length, pitch, rows, stack, structural: rivet.kind !== 'blind-general', rivet });

interface DemoAssembly {
  name: string;
  status: AssemblyStatus;
  /** Planned start and finish, in days from today (negative: already begun). */
  days: [number, number];
  lines: ReturnType<typeof line>[];
  /** Extra items by the demo bin's name. */
  extras?: [string, number][];
  notes?: string;
}

interface DemoBuild {
  who: string;
  name: string;
  description: string;
  edgeFloorIn?: number;
  assemblies: DemoAssembly[];
}

const FLAP_LINES = [
  line('Top skin to spar', 48, 1.25, 1, [0.025, 0.032], blind(4)),
  line('Ribs to skin', 18, 1.25, 6, [0.025, 0.032], blind(4)),
  line('Trailing edge, flush', 48, 1, 1, [0.016, 0.025, 0.016], blind(4, 'countersunk')),
];

/** The invented chapter's plans for the next six months: four builds, eleven assemblies. */
const DEMO_BUILDS: DemoBuild[] = [
  {
    who: 'member@example.org',
    name: 'Two-seat low-wing kit, wings',
    description: 'Flaps this winter, then the wingtips.',
    edgeFloorIn: 0.375,
    assemblies: [
      { name: 'Left flap', status: 'done', days: [-40, -2], lines: FLAP_LINES },
      { name: 'Right flap', status: 'in_progress', days: [-5, 30], lines: FLAP_LINES },
      {
        name: 'Wingtip fairings',
        status: 'planned',
        days: [45, 70],
        lines: [line('Fairing flange to tip rib', 30, 1.25, 2, [0.06, 0.08], soft)],
        extras: [['Screw #8-32 × 1/2 pan head, stainless', 16]],
        notes: 'Fibreglass fairings: general-purpose rivets on the non-structural flange only.',
      },
    ],
  },
  {
    who: 'tomasz.wren@example.org',
    name: 'Two-seat kit, tail feathers',
    description: 'Solid rivets throughout; bucked with a partner on Saturdays.',
    assemblies: [
      {
        name: 'Rudder',
        status: 'in_progress',
        days: [-12, 20],
        lines: [line('Skin to spar', 42, 1, 2, [0.02, 0.032], solid(4)), line('Ribs to skin', 12, 1.25, 8, [0.016, 0.02], solid(4)), line('Counterbalance arm', 8, 1, 1, [0.04, 0.063], solid(4))],
      },
      {
        name: 'Horizontal stabiliser skins',
        status: 'planned',
        days: [25, 75],
        lines: [line('Front spar', 48, 1.25, 2, [0.032, 0.04], solid(4)), line('Rear spar', 48, 1.25, 1, [0.032, 0.063], solid(4)), line('Nose ribs, flush', 10, 0.75, 6, [0.025, 0.032], solid(3, 'countersunk'))],
      },
      { name: 'Elevators', status: 'planned', days: [80, 140], lines: [line('Skin to spar', 36, 1, 2, [0.025, 0.025], solid(4)), line('Horn brackets', 6, 1, 2, [0.063, 0.063], solid(4))] },
      { name: 'Vertical stabiliser', status: 'planned', days: [150, 180], lines: [line('Skin to spars', 30, 1.25, 2, [0.032, 0.032], solid(4)), line('Ribs to skin', 10, 0.75, 5, [0.02, 0.032], solid(3))] },
    ],
  },
  {
    who: 'ines.parra@example.org',
    name: 'Utility trailer',
    description: 'Aluminium skins over a steel frame.',
    assemblies: [
      {
        name: 'Side skins',
        status: 'in_progress',
        days: [-8, 25],
        lines: [line('Skin to top rail', 48, 1.5, 3, [0.04, 0.063], blind(5)), line('Corner posts, flush', 36, 1.25, 2, [0.032, 0.063], blind(4, 'countersunk'))],
      },
      {
        name: 'Tailgate',
        status: 'planned',
        days: [35, 60],
        lines: [line('Hinge strap', 48, 1.5, 2, [0.125, 0.09], blind(6)), line('Panel to frame', 40, 1.5, 2, [0.1, 0.1], blind(5))],
        extras: [
          ['Nutplate #8-32, two-lug, self-locking', 6],
          ['Screw #8-32 × 5/8 100° flat head, stainless', 6],
        ],
      },
    ],
  },
  {
    who: 'kelechi.obi@example.org',
    name: 'Hangar tool chest',
    description: 'A riveted chest for the chapter’s shared bench.',
    assemblies: [
      {
        name: 'Lid',
        status: 'planned',
        days: [10, 24],
        lines: [line('Lid skin to frame', 24, 0.75, 2, [0.025, 0.025], blind(3)), line('Hinge doubler, flush', 20, 1.25, 1, [0.063, 0.063], blind(4, 'countersunk'))],
      },
      { name: 'Drawer runners', status: 'planned', days: [90, 120], lines: [line('Runner to side', 20, 1.25, 2, [0.032, 0.05], blind(4))], extras: [['Screw #6-32 × 1/2 pan head, stainless', 24]] },
    ],
  },
];

/** How much of each need was drawn so far: a done assembly all of it and a little waste, one in progress about 40 %. */
const DRAWN_SHARE: Partial<Record<AssemblyStatus, number>> = { done: 1.06, in_progress: 0.4 };

export interface DemoBuildsSummary {
  builds: number;
  assemblies: number;
  draws: number;
}

/**
 * Seeds the members' builds through the planning services, after the demo stock. Assemblies already
 * begun get draws that name them, through the stock service: each after the bin's last entry (the
 * ledger runs forward in time per bin) and never taking a bin to its reorder point, so the demo's
 * Restock list stays as the stock seed left it.
 */
export function seedDemoBuilds(db: Database, now: Date = new Date()): DemoBuildsSummary {
  let clock = new Date(now.getTime() - 60 * DAY_MS);
  const ctx: ServiceContext = { db, publicUrl: 'http://localhost', now: () => clock };
  const zone = readChapterTimeZone(db);
  const today = startOfChapterDay(now, zone);
  const day = (offset: number) => chapterDay(addChapterDays(today, offset, zone), zone);
  const summary: DemoBuildsSummary = { builds: 0, assemblies: 0, draws: 0 };

  db.$client.transaction(() => {
    for (const b of DEMO_BUILDS) {
      const owner = findUserByEmail(db, b.who)!;
      const build = createBuild(ctx, owner, createBuildBodySchema.parse({ name: b.name, description: b.description, edgeFloorIn: b.edgeFloorIn ?? null }));
      summary.builds++;
      for (const a of b.assemblies) {
        clock = new Date(now.getTime() - 60 * DAY_MS);
        const extraItems = (a.extras ?? []).flatMap(([name, quantity]) => {
          const code = binCodeNamed(db, name);
          return code ? [{ binCode: code, quantity }] : [];
        });
        const body: CreateAssemblyBody = { name: a.name, status: a.status, plannedStart: day(a.days[0]), plannedFinish: day(a.days[1]), unit: 'in', lines: a.lines, extraItems, notes: a.notes ?? '' };
        const assembly = createAssembly(ctx, owner, build.id, createAssemblyBodySchema.parse(body));
        summary.assemblies++;
        const share = DRAWN_SHARE[a.status];
        if (!share) continue;
        const begun = addChapterDays(today, a.days[0], zone).getTime() + 9 * HOUR_MS;
        for (const need of assemblyBill(db, findAssembly(db, assembly.id)!)) {
          if (!need.bin || need.lines.length === 0) continue;
          const bin = findBinByCode(db, need.bin.code)!;
          const quantity = Math.min(Math.round(need.estimated * share), bin.onHand - bin.reorderPoint - 1);
          if (quantity <= 0) continue;
          // Two sessions: the first on the day work began, or just after the bin's last entry.
          for (const [i, part] of [Math.ceil(quantity / 2), Math.floor(quantity / 2)].entries()) {
            if (part <= 0) continue;
            clock = new Date(Math.min(now.getTime(), Math.max(begun + i * 2 * DAY_MS, (lastEntryAt(db, bin.id)?.getTime() ?? 0) + MINUTE_MS)));
            draw(ctx, owner, bin.code, { quantity: part, assemblyId: assembly.id, note: a.name });
            summary.draws++;
          }
        }
      }
    }
  })();
  return summary;
}
