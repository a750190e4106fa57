import type { CreateToolInput } from '@shared/schemas/tools';
import { createToolBodySchema } from '@shared/schemas/tools';
import { findUserByEmail } from '../accounts/users.repo';
import type { ServiceContext } from '../context';
import type { Database } from '../db/client';
import type { UserRow } from '../db/schema/users';
import { placeHold } from '../features/tools/holds.service';
import { checkOut, returnTool } from '../features/tools/loans.service';
import { askForSignoff } from '../features/tools/signoff-requests.service';
import { defineSignoff, grantSignoff } from '../features/tools/signoffs.service';
import { changeToolStatus } from '../features/tools/tool-status.service';
import { createTool } from '../features/tools/tools.service';
import { seedDemoLoanHistory } from './demo-loan-history';
import { DAY_MS } from '@shared/time/durations';


type DemoTool = Partial<CreateToolInput> & Pick<CreateToolInput, 'name' | 'category'> & { signoff?: 'air' | 'gun' };

const nosepieces = ['Nosepiece 3/32', 'Nosepiece 1/8', 'Nosepiece 5/32'];
const bit = (size: string, name: string, location: string, value: number): DemoTool => ({
  name,
  category: 'drill_bit',
  drillSize: size,
  location,
  replacementValueCents: value,
});

/** The invented chapter's crib: about sixty tools, in the words a builder would use. */
const DEMO_TOOLS: DemoTool[] = [
  { name: 'Hand rivet puller, short handle', category: 'hand_rivet_puller', location: 'Cabinet A, drawer 1', replacementValueCents: 3200, accessories: nosepieces },
  { name: 'Hand rivet puller, short handle', category: 'hand_rivet_puller', location: 'Cabinet A, drawer 1', replacementValueCents: 3200, accessories: nosepieces },
  { name: 'Hand rivet puller, long handle', category: 'hand_rivet_puller', location: 'Cabinet A, drawer 1', replacementValueCents: 5400, accessories: nosepieces },
  { name: 'Hand rivet puller, long handle', category: 'hand_rivet_puller', location: 'Cabinet A, drawer 1', replacementValueCents: 5400, accessories: nosepieces },
  { name: 'Rivet puller with domed-head nosepiece', category: 'hand_rivet_puller', location: 'Cabinet A, drawer 1', replacementValueCents: 6100, accessories: ['Domed-head nosepiece 1/8', 'Nosepiece 1/8'], notes: 'Nosepiece reshaped in the shop to form a domed head.' },
  { name: 'Pneumatic rivet puller', category: 'pneumatic_rivet_puller', location: 'Air tool shelf', replacementValueCents: 28500, accessories: nosepieces, signoff: 'air' },
  { name: 'Pneumatic rivet puller, compact', category: 'pneumatic_rivet_puller', location: 'Air tool shelf', replacementValueCents: 31900, accessories: ['Nosepiece 1/8', 'Nosepiece 5/32'], signoff: 'air' },
  { name: 'Air drill, pistol grip', category: 'air_drill', location: 'Air tool shelf', replacementValueCents: 12900, signoff: 'air' },
  { name: 'Air drill, pistol grip', category: 'air_drill', location: 'Air tool shelf', replacementValueCents: 12900, signoff: 'air' },
  { name: 'Air drill, 90° angle head', category: 'air_drill', location: 'Air tool shelf', replacementValueCents: 21500, signoff: 'air' },
  { name: 'Air drill, 45° angle head', category: 'air_drill', location: 'Air tool shelf', replacementValueCents: 19800, signoff: 'air' },
  { name: 'Rivet gun, 2X', category: 'rivet_gun', location: 'Air tool shelf', replacementValueCents: 18900, accessories: ['Universal-head rivet set', 'Flush set', 'Beehive spring'], signoff: 'gun' },
  { name: 'Rivet gun, 3X', category: 'rivet_gun', location: 'Air tool shelf', replacementValueCents: 22900, accessories: ['Universal-head rivet set', 'Flush set', 'Beehive spring'], signoff: 'gun' },
  { name: 'Bucking bar, tungsten, 1.9 lb', category: 'bucking_bar', location: 'Cabinet B, drawer 2', replacementValueCents: 16500 },
  { name: 'Bucking bar, steel, 2.5 lb', category: 'bucking_bar', location: 'Cabinet B, drawer 2', replacementValueCents: 4200 },
  { name: 'Bucking bar, steel, thin', category: 'bucking_bar', location: 'Cabinet B, drawer 2', replacementValueCents: 3900 },
  { name: 'Bucking bar, steel, offset', category: 'bucking_bar', location: 'Cabinet B, drawer 2', replacementValueCents: 4400 },
  bit('#40', 'Drill bit #40, jobber', 'Drill index 1', 300),
  bit('#40', 'Drill bit #40, jobber', 'Drill index 1', 300),
  bit('#40', 'Drill bit #40, 12 in long', 'Long bit rack', 1100),
  bit('#30', 'Drill bit #30, jobber', 'Drill index 1', 320),
  bit('#30', 'Drill bit #30, jobber', 'Drill index 1', 320),
  bit('#30', 'Drill bit #30, 12 in long', 'Long bit rack', 1200),
  bit('#21', 'Drill bit #21, jobber', 'Drill index 1', 350),
  bit('#21', 'Drill bit #21, jobber', 'Drill index 1', 350),
  bit('#20', 'Drill bit #20, jobber', 'Drill index 1', 350),
  bit('#20', 'Drill bit #20, jobber', 'Drill index 1', 350),
  bit('#12', 'Drill bit #12, jobber', 'Drill index 2', 390),
  bit('#11', 'Drill bit #11, jobber', 'Drill index 2', 390),
  bit('#11', 'Drill bit #11, jobber', 'Drill index 2', 390),
  bit('#40', 'Drill bit #40, threaded for angle drill', 'Drill index 2', 650),
  bit('1/8', 'Drill bit 1/8, stubby', 'Drill index 2', 280),
  { name: 'Temporary fasteners 3/32, tray', category: 'temporary_fastener_tray', traySize: '3/32', trayCapacity: 50, location: 'Cabinet C, shelf 1', replacementValueCents: 4500 },
  { name: 'Temporary fasteners 1/8, tray', category: 'temporary_fastener_tray', traySize: '1/8', trayCapacity: 50, location: 'Cabinet C, shelf 1', replacementValueCents: 4500 },
  { name: 'Temporary fasteners 1/8, tray', category: 'temporary_fastener_tray', traySize: '1/8', trayCapacity: 50, location: 'Cabinet C, shelf 1', replacementValueCents: 4500 },
  { name: 'Temporary fasteners 5/32, tray', category: 'temporary_fastener_tray', traySize: '5/32', trayCapacity: 40, location: 'Cabinet C, shelf 1', replacementValueCents: 4800 },
  { name: 'Temporary fasteners 3/16, tray', category: 'temporary_fastener_tray', traySize: '3/16', trayCapacity: 30, location: 'Cabinet C, shelf 1', replacementValueCents: 5200 },
  { name: 'Temporary fastener pliers', category: 'other', location: 'Cabinet C, shelf 1', replacementValueCents: 1400 },
  { name: 'Temporary fastener pliers', category: 'other', location: 'Cabinet C, shelf 1', replacementValueCents: 1400 },
  { name: 'Deburring tool, swivel blade', category: 'deburring_tool', location: 'Cabinet A, drawer 3', replacementValueCents: 900 },
  { name: 'Deburring tool, swivel blade', category: 'deburring_tool', location: 'Cabinet A, drawer 3', replacementValueCents: 900 },
  { name: 'Deburring bit, 3-flute, with handle', category: 'deburring_tool', location: 'Cabinet A, drawer 3', replacementValueCents: 1500 },
  { name: 'Edge deburring tool', category: 'deburring_tool', location: 'Cabinet A, drawer 3', replacementValueCents: 1800 },
  { name: 'Rivet spacing fan, 10 hole', category: 'spacing_fan', location: 'Wall rack', replacementValueCents: 6500 },
  { name: 'Rivet spacing fan, 12 hole', category: 'spacing_fan', location: 'Wall rack', replacementValueCents: 7400 },
  { name: 'Torque wrench, 20–150 in-lb', category: 'torque_wrench', location: 'Cabinet B, drawer 1', replacementValueCents: 14900, serviceIntervalDays: 365 },
  { name: 'Torque wrench, 10–80 ft-lb', category: 'torque_wrench', location: 'Cabinet B, drawer 1', replacementValueCents: 16900, serviceIntervalDays: 365 },
  { name: 'Dial caliper, 6 in', category: 'measuring', location: 'Cabinet B, drawer 1', replacementValueCents: 4900, serviceIntervalDays: 730 },
  { name: 'Rivet length gauge', category: 'measuring', location: 'Cabinet B, drawer 1', replacementValueCents: 1200 },
  { name: 'Edge distance marker', category: 'measuring', location: 'Cabinet B, drawer 1', replacementValueCents: 1600 },
  { name: 'Countersink cage with 100° cutter', category: 'other', location: 'Cabinet A, drawer 2', replacementValueCents: 8900, accessories: ['#30 pilot cutter', '#40 pilot cutter'] },
  { name: 'Countersink cage with 100° cutter', category: 'other', location: 'Cabinet A, drawer 2', replacementValueCents: 8900, accessories: ['#30 pilot cutter'] },
  { name: 'Dimple dies 100°, 3/32, with squeezer yoke', category: 'dimple_dies', rivetDiameter32: 3, location: 'Cabinet A, drawer 2', replacementValueCents: 7800 },
  { name: 'Hand rivet squeezer', category: 'other', location: 'Cabinet A, drawer 2', replacementValueCents: 19500, accessories: ['Flat sets', '3 in yoke'] },
  { name: 'Aviation snips, left cut', category: 'other', location: 'Wall rack', replacementValueCents: 2200 },
  { name: 'Aviation snips, right cut', category: 'other', location: 'Wall rack', replacementValueCents: 2200 },
  { name: 'Hand seamer, straight jaw', category: 'other', location: 'Wall rack', replacementValueCents: 2600 },
  { name: 'Spring clamps, set of 6', category: 'other', location: 'Wall rack', replacementValueCents: 1800 },
  { name: 'Fluting pliers', category: 'other', location: 'Wall rack', replacementValueCents: 2400 },
  // Last in the list, so the tools above keep their label codes.
  { name: 'Countersink cutter 100°, 1/8, #30 pilot', category: 'countersink_cutter', rivetDiameter32: 4, drillSize: '#30', location: 'Cabinet A, drawer 2', replacementValueCents: 2900 },
  { name: 'Dimple dies 100°, 1/8', category: 'dimple_dies', rivetDiameter32: 4, location: 'Cabinet A, drawer 2', replacementValueCents: 3600 },
];

/**
 * Seeds the invented chapter's crib through the same services members use, at dates in the past,
 * so its audit trail, loans (two overdue), a hold and a tool due for calibration read as real.
 */
export function seedDemoCrib(db: Database, now: Date = new Date()): void {
  let clock = now;
  const ctx: ServiceContext = { db, publicUrl: 'http://localhost', now: () => clock };
  const at = (daysAgo: number) => (clock = new Date(now.getTime() - daysAgo * DAY_MS));
  const person = (email: string): UserRow => findUserByEmail(db, email)!;
  const lead = person('lead@example.org');
  const quartermaster = person('quartermaster@example.org');
  const marco = person('member@example.org');
  const ines = person('ines.parra@example.org');
  const tomasz = person('tomasz.wren@example.org');
  const kelechi = person('kelechi.obi@example.org');

  at(400);
  const air = defineSignoff(ctx, { name: 'Air tools', description: 'Pneumatic rivet pullers and air drills: eye and hearing protection, hose and coupling checks.' });
  const gun = defineSignoff(ctx, { name: 'Rivet gun and bucking', description: 'Solid riveting with a rivet gun and bucking bar, after a practice session on scrap.' });
  for (const p of [quartermaster, marco, ines, tomasz]) grantSignoff(ctx, lead, air.id, p.id);
  for (const p of [quartermaster, tomasz]) grantSignoff(ctx, lead, gun.id, p.id);

  const codes = DEMO_TOOLS.map(({ signoff, ...tool }) => {
    const requiredSignoffId = signoff === 'air' ? air.id : signoff === 'gun' ? gun.id : null;
    const lastServiceAt = tool.serviceIntervalDays ? new Date(now.getTime() - 370 * DAY_MS).toISOString() : null;
    return createTool(ctx, quartermaster, createToolBodySchema.parse({ ...tool, requiredSignoffId, lastServiceAt })).code;
  });
  const code = (name: string, nth = 0) => codes.filter((_, i) => DEMO_TOOLS[i]!.name === name)[nth]!;

  // Half a year of loans before the recent ones, for the lead's overview. The rest of the crib is never lent.
  const anyone = [quartermaster, marco, ines, tomasz, kelechi];
  const airSignedOff = [quartermaster, marco, ines, tomasz];
  const gunSignedOff = [quartermaster, tomasz];
  const often = (name: string, weight: number, borrowers = anyone, nth = 0) => {
    const i = codes.indexOf(code(name, nth));
    return { code: codes[i]!, category: DEMO_TOOLS[i]!.category, weight, borrowers, trayCapacity: DEMO_TOOLS[i]!.trayCapacity ?? undefined };
  };
  seedDemoLoanHistory(ctx, at, [
    often('Hand rivet puller, short handle', 6),
    often('Hand rivet puller, long handle', 4),
    often('Pneumatic rivet puller', 5, airSignedOff),
    often('Air drill, pistol grip', 6, airSignedOff),
    often('Air drill, pistol grip', 3, airSignedOff, 1),
    often('Air drill, 90° angle head', 2, airSignedOff),
    often('Rivet gun, 2X', 3, gunSignedOff),
    often('Bucking bar, tungsten, 1.9 lb', 3),
    often('Drill bit #40, jobber', 5),
    often('Drill bit #30, jobber', 4),
    often('Temporary fasteners 1/8, tray', 4),
    often('Temporary fasteners 3/32, tray', 3),
    often('Deburring tool, swivel blade', 3),
    often('Rivet spacing fan, 12 hole', 2),
    often('Torque wrench, 20–150 in-lb', 1),
    often('Hand rivet squeezer', 2),
    often('Countersink cage with 100° cutter', 2),
  ]);

  // The second torque wrench came back from calibration recently; the first is overdue for it.
  at(30);
  changeToolStatus(ctx, quartermaster, code('Torque wrench, 10–80 ft-lb'), 'out_of_service', 'Sent for calibration');
  at(5);
  changeToolStatus(ctx, quartermaster, code('Torque wrench, 10–80 ft-lb'), 'back_in_service', 'Calibrated, certificate in the binder', true);

  at(21);
  checkOut(ctx, kelechi, code('Temporary fasteners 1/8, tray'), {});
  at(10);
  checkOut(ctx, ines, code('Pneumatic rivet puller'), { accessories: ['Nosepiece 1/8', 'Nosepiece 5/32'] });
  at(9);
  checkOut(ctx, marco, code('Drill bit #30, jobber'), {});
  checkOut(ctx, marco, code('Temporary fasteners 3/32, tray'), {});
  at(6);
  placeHold(ctx, tomasz, code('Pneumatic rivet puller'));
  at(4);
  checkOut(ctx, marco, code('Drill bit #40, jobber'), {});
  returnTool(ctx, marco, code('Drill bit #40, jobber'), { condition: 'ok' });
  at(3);
  checkOut(ctx, tomasz, code('Rivet gun, 3X'), { accessories: ['Universal-head rivet set', 'Flush set'] });
  // The flush set did not come back: it waits on the Service list until it turns up or is replaced.
  returnTool(ctx, tomasz, code('Rivet gun, 3X'), { condition: 'needs_attention', note: 'Throttle valve leaks air', accessoriesBack: ['Universal-head rivet set'] });
  at(2);
  checkOut(ctx, quartermaster, code('Air drill, 90° angle head'), {});
  checkOut(ctx, tomasz, code('Rivet spacing fan, 12 hole'), {});
  at(1);
  checkOut(ctx, ines, code('Deburring tool, swivel blade'), {});
  // Set aside for Marco's right flap: his to collect within the chapter's hold time.
  placeHold(ctx, marco, code('Hand rivet squeezer'));
  changeToolStatus(ctx, quartermaster, code('Edge deburring tool'), 'lost', 'Not in the drawer at the monthly count');

  // Two members asked for a sign-off from a tool's page; the lead has yet to answer.
  at(2);
  askForSignoff(ctx, kelechi, { toolCode: code('Air drill, pistol grip'), note: 'I used air drills at my last job; happy to be shown the crib’s hoses first.' });
  at(1);
  askForSignoff(ctx, marco, { toolCode: code('Rivet gun, 2X'), note: 'Did the practice session on scrap last Saturday.' });
}
