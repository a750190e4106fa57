import type { AssemblyEstimate } from '@shared/schemas/builds';
import type { MemberTodayAssembly } from '@shared/schemas/today-member';
import { countWords } from '@shared/stock/quantity-words';
import { STATUS_LABELS, TOOL_STATUSES, type ToolStatus } from '@shared/tools/categories';
import { HELD_FOR_YOU } from '../features/planning/crib-kit';

/** Kit tools the member can take now: free on the shelf, set aside for them, or already out with them. */
const READY = new Set<string>(['available', HELD_FOR_YOU]);

const statusWords = (status: string) => ((TOOL_STATUSES as readonly string[]).includes(status) ? STATUS_LABELS[status as ToolStatus].toLowerCase() : status);

/**
 * What an assembly's kit still lacks, from its own estimate: the crib kit's picks that are not free
 * for the member (in the kit's own note), and the bill's lines no bin stocks or whose bin is short
 * (the bill's shortBy counts only what is still to draw).
 */
export function kitLacks(estimate: Pick<AssemblyEstimate, 'kit' | 'bill'>, onLoanToMember: ReadonlySet<string>): Pick<MemberTodayAssembly, 'tools' | 'bins'> {
  const tools = estimate.kit
    .filter((k) => !k.tool || !(READY.has(k.tool.status) || onLoanToMember.has(k.tool.code)))
    .map((k) => ({
      need: k.need,
      tool: k.tool && { code: k.tool.code, name: k.tool.name },
      words: k.note ?? (k.tool ? statusWords(k.tool.status) : 'none in the crib'),
    }));
  const bins = estimate.bill
    .filter((b) => b.unstocked !== null || b.shortBy > 0)
    .map((b) => ({
      description: b.description,
      binCode: b.bin?.code ?? null,
      words: b.unstocked ?? `short by ${countWords(b.shortBy)}: ${countWords(b.bin?.onHand ?? 0)} on hand, ${countWords(b.toDraw)} still to draw`,
    }));
  return { tools, bins };
}
