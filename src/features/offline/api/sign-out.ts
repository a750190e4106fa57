import { clearCatalogues } from './catalogue';
import { waitingOf } from './queue';

/**
 * Signing out leaves no copy of the chapter's catalogue on the phone. The member's waiting actions
 * stay (nothing is dropped) and go when they sign in here again: answers how many there are.
 */
export async function forgetOnSignOut(memberId: number): Promise<number> {
  await clearCatalogues();
  return (await waitingOf(memberId)).length;
}
