import type { QueuedAction } from '../db';

/** A queued action in a few words: "Check out T-0042", "Draw 50 from B-0107". */
export function describeAction(entry: Pick<QueuedAction, 'kind' | 'code' | 'body'>): string {
  const quantity = 'quantity' in entry.body ? entry.body.quantity : 0;
  switch (entry.kind) {
    case 'check_out':
      return `Check out ${entry.code}`;
    case 'return':
      return `Return ${entry.code}`;
    case 'draw':
      return `Draw ${quantity} from ${entry.code}`;
    case 'return_unused':
      return `Return ${quantity} unused to ${entry.code}`;
  }
}
