import type { QueuedActionKind } from '@shared/schemas/offline';

/** What the member can do when the server refuses a queued action, by the server's error code. */
const NEXT_STEPS: Record<string, string> = {
  TOOL_ON_LOAN: 'Someone else has the tool: put it back on the shelf or join the queue for it.',
  TOOL_HELD: 'The tool is held for someone else: put it back on the shelf or join the queue for it.',
  SIGNOFF_REQUIRED: 'You need the sign-off before using it: put it back and ask the chapter lead.',
  TOOL_OUT_OF_SERVICE: 'Put the tool back and tell the quartermaster.',
  TOOL_UNAVAILABLE: 'Put the tool back and tell the quartermaster.',
  TOOL_NOT_ON_LOAN: 'It is already back in Gripline: nothing more to do, unless it looks wrong to you.',
  NOT_YOUR_LOAN: 'Give the tool to the quartermaster to return it.',
  COUNT_REQUIRED: 'Scan the tray again and return it with the count.',
  COUNT_TOO_HIGH: 'Count the tray again and return it once more.',
  INSUFFICIENT_STOCK: 'Draw fewer or ask the quartermaster.',
  RETURN_EXCEEDS_DRAWN: 'Return fewer or ask the quartermaster.',
  ASSEMBLY_NOT_YOURS: 'Draw again without the assembly, or choose one of yours.',
  TOOL_NOT_FOUND: 'Check the label and tell the quartermaster.',
  BIN_NOT_FOUND: 'Check the label and tell the quartermaster.',
};

const FALLBACK: Record<QueuedActionKind, string> = {
  check_out: 'Scan the tool again and check it out while online, or ask the quartermaster.',
  return: 'Scan the tool again and return it while online, or ask the quartermaster.',
  draw: 'Scan the bin again and draw while online, or ask the quartermaster.',
  return_unused: 'Scan the bin again and return while online, or ask the quartermaster.',
};

export function nextStepFor(kind: QueuedActionKind, code: string): string {
  return NEXT_STEPS[code] ?? FALLBACK[kind];
}
