import type { Catalogue, CatalogueBin, CatalogueTool } from '@shared/schemas/offline';
import type { CheckoutBody, ReturnBody } from '@shared/schemas/tools';
import { STATUS_LABELS } from '@shared/tools/categories';
import { heldWords, loanWords } from '@shared/tools/tool-words';
import { chapterTimeZone } from '@/lib/chapter-zone';
import type { QueuedAction } from '../db';

export interface OfflineTool {
  tool: CatalogueTool;
  /** The member has it: by the copy, or by a check out waiting to send. */
  yours: boolean;
  canCheckOut: boolean;
  canReturn: boolean;
  /** Why neither is possible, in a sentence. */
  reason: string | null;
  /** This member's actions on it still waiting to send, oldest first. */
  waiting: QueuedAction[];
}

/**
 * The tool as the copy shows it, moved on by the member's own waiting actions (a queued check out
 * makes it theirs; a queued return puts it back on the shelf, or out of service when it needs
 * attention). The server decides for real on replay; this only decides what to offer.
 */
export function offlineTool(catalogue: Catalogue, code: string, waiting: QueuedAction[]): OfflineTool | undefined {
  const tool = catalogue.tools.find((t) => t.code === code);
  if (!tool) return undefined;
  const mine = waiting.filter((a) => a.code === code && (a.kind === 'check_out' || a.kind === 'return'));
  let status = tool.status;
  let yours = catalogue.yourLoans.some((l) => l.code === code);
  // What went out with the loan, to tick back at return: a waiting check out says what it took.
  let accessoriesOut = tool.accessoriesOut;
  for (const action of mine) {
    yours = action.kind === 'check_out';
    status = yours ? 'on_loan' : (action.body as ReturnBody).condition === 'needs_attention' ? 'out_of_service' : 'available';
    accessoriesOut = yours ? ((action.body as CheckoutBody).accessories ?? null) : null;
  }
  const heldForYou = status === 'held' && mine.length === 0 && tool.heldFor?.id === catalogue.you.id;
  const signedOff = tool.requiredSignoffId === null || catalogue.yourSignoffs.includes(tool.requiredSignoffId);
  const free = status === 'available' || heldForYou;
  let reason: string | null = null;
  if (yours) reason = null;
  else if (free && !signedOff) reason = `Needs the "${tool.requiredSignoffName ?? 'required'}" sign-off, which you do not have yet.`;
  else if (status === 'on_loan' && tool.holder) reason = tool.dueAt ? loanWords({ name: tool.holder.name, you: false }, new Date(tool.dueAt), new Date(), chapterTimeZone()) : `${tool.holder.name} has it.`;
  else if (status === 'held' && !heldForYou) reason = tool.heldFor ? heldWords(tool.heldFor.name, null, chapterTimeZone()) : 'It is set aside for the next person.';
  else if (!free) reason = `${STATUS_LABELS[status]}.`;
  return { tool: { ...tool, accessoriesOut }, yours, canCheckOut: !yours && free && signedOff, canReturn: yours, reason, waiting: mine };
}

export interface OfflineBin {
  bin: CatalogueBin;
  /** On hand by the copy, less the member's waiting draws, plus their waiting returns. */
  onHand: number;
  /** What the member may still return unused, counting their waiting actions. */
  drawnByYou: number;
  waiting: QueuedAction[];
}

export function offlineBin(catalogue: Catalogue, code: string, waiting: QueuedAction[]): OfflineBin | undefined {
  const bin = catalogue.bins.find((b) => b.code === code);
  if (!bin) return undefined;
  const mine = waiting.filter((a) => a.code === code && (a.kind === 'draw' || a.kind === 'return_unused'));
  let moved = 0;
  for (const action of mine) {
    const quantity = (action.body as { quantity: number }).quantity;
    moved += action.kind === 'draw' ? quantity : -quantity;
  }
  return { bin, onHand: Math.max(0, bin.onHand - moved), drawnByYou: Math.max(0, bin.drawnByYou + moved), waiting: mine };
}
