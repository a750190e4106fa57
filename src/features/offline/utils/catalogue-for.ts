import type { Catalogue } from '@shared/schemas/offline';
import type { StationCopy } from '@shared/schemas/stations';
import type { ReturnBody } from '@shared/schemas/tools';
import type { QueuedAction } from '../db';

/**
 * One person's catalogue, composed from the station's copy: the shared tools and bins, with their
 * own loans, sign-offs, assemblies and what they drew from each bin. Other people's actions still
 * waiting at the station move the tools and bins on (a tool someone took offline is not on the
 * shelf for the next person); the person's own waiting actions are applied by the offline views.
 */
export function catalogueFor(copy: StationCopy, personId: number, waitingAtStation: readonly QueuedAction[] = []): Catalogue | undefined {
  const person = copy.people.find((p) => p.id === personId);
  if (!person) return undefined;
  const tools = new Map(copy.tools.map((t) => [t.code, t]));
  const onHand = new Map(copy.bins.map((b) => [b.code, b.onHand]));
  for (const action of waitingAtStation) {
    if (action.memberId === personId) continue;
    const tool = tools.get(action.code);
    if (tool && action.kind === 'check_out') {
      tools.set(tool.code, { ...tool, status: 'on_loan', holder: { id: action.memberId, name: action.station?.personName ?? 'Someone' }, dueAt: null, heldFor: null });
    } else if (tool && action.kind === 'return') {
      const needsAttention = (action.body as ReturnBody).condition === 'needs_attention';
      tools.set(tool.code, { ...tool, status: needsAttention ? 'out_of_service' : 'available', holder: null, dueAt: null, accessoriesOut: null });
    } else if (onHand.has(action.code) && (action.kind === 'draw' || action.kind === 'return_unused')) {
      const quantity = (action.body as { quantity: number }).quantity;
      onHand.set(action.code, Math.max(0, onHand.get(action.code)! + (action.kind === 'draw' ? -quantity : quantity)));
    }
  }
  return {
    takenAt: copy.takenAt,
    you: { id: person.id, name: person.name, role: person.role },
    tools: [...tools.values()],
    bins: copy.bins.map((b) => ({ ...b, onHand: onHand.get(b.code) ?? b.onHand, drawnByYou: person.drawn[b.code] ?? 0 })),
    yourLoans: person.loans,
    yourSignoffs: person.signoffs,
    yourAssemblies: person.assemblies,
  };
}
