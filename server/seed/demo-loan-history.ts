import { seededRandom } from '@shared/random/seeded';
import { DEFAULT_LOAN_DAYS, type ToolCategory } from '@shared/tools/categories';
import type { ServiceContext } from '../context';
import type { UserRow } from '../db/schema/users';
import { checkOut, returnTool } from '../features/tools/loans.service';

/** A tool the demo builders borrow, how often (relative), its kind and who may take it (sign-offs). */
interface Borrowed {
  code: string;
  category: ToolCategory;
  weight: number;
  borrowers: UserRow[];
  /** Temporary fastener trays: how many a full tray holds (they come back full). */
  trayCapacity?: number;
}

interface HistoryEvent {
  daysAgo: number;
  run: () => void;
}

/**
 * Half a year of invented crib use before the demo’s recent loans: from 182 to 22 days ago, on most
 * days one or two tools go out and come back, mostly on time, some a few days late (so the lead's
 * overview has weeks of loans and of days overdue to show). Every tool is back before the recent
 * loans start, and nobody borrows before they joined. Deterministic: a seeded generator.
 */
export function seedDemoLoanHistory(ctx: ServiceContext, at: (daysAgo: number) => void, borrowed: Borrowed[]): void {
  const random = seededRandom(417_026);
  const pick = <T>(items: T[]): T => items[Math.floor(random() * items.length)]!;
  const totalWeight = borrowed.reduce((s, b) => s + b.weight, 0);
  const pickTool = (): Borrowed => {
    let r = random() * totalWeight;
    return borrowed.find((b) => (r -= b.weight) < 0) ?? borrowed.at(-1)!;
  };
  const backAt = new Map<string, number>(); // days ago each tool's last loan comes back
  const events: HistoryEvent[] = [];
  for (let day = 182; day >= 28; day--) {
    const loansToday = random() < 0.3 ? 0 : random() < 0.6 ? 1 : 2;
    for (let n = 0; n < loansToday; n++) {
      const tool = pickTool();
      const out = day - (9 + Math.floor(random() * 9)) / 24; // between 09:00 and 18:00 of the day, roughly
      if (out > (backAt.get(tool.code) ?? Infinity) - 0.01) continue; // still out then
      const loanDays = DEFAULT_LOAN_DAYS[tool.category];
      // One loan in six comes back late, by one to six days; the rest within their loan period.
      const keptDays = random() < 1 / 6 ? loanDays + 1 + Math.floor(random() * 6) : 1 + Math.floor(random() * loanDays);
      const back = Math.max(out - keptDays, 22);
      const who = pick(tool.borrowers);
      backAt.set(tool.code, back);
      events.push({ daysAgo: out, run: () => checkOut(ctx, who, tool.code, {}) });
      events.push({
        daysAgo: back,
        run: () =>
          returnTool(ctx, who, tool.code, tool.trayCapacity !== undefined ? { condition: 'ok', returnedCount: tool.trayCapacity } : { condition: 'ok' }),
      });
    }
  }
  for (const e of events.sort((a, b) => b.daysAgo - a.daysAgo)) {
    at(e.daysAgo);
    e.run();
  }
}
