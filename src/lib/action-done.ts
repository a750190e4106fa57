import { toast } from 'sonner';

/** What a form calls once its action went through, with the sentence that confirmed it. */
export type ActionDone = (said: string) => void;

/**
 * Confirms an action in one sentence: the toast, and the same words to the screen that opened the
 * form (the crib station repeats them in large type). One rule, so the two never say different things.
 */
export function confirmDone(said: string, onDone?: ActionDone): void {
  toast.success(said);
  onDone?.(said);
}
