import { useState } from 'react';
import { Link } from 'react-router';
import { toast } from 'sonner';
import type { Person } from '@shared/schemas/people';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/lib/errors';
import { useClearPin } from '../api/clear-pin';

const chip = (on: boolean) => `rounded px-2 py-0.5 text-sm font-medium ${on ? 'bg-ok-soft text-ok' : 'bg-paper text-steel'}`;

/** Whether the person can sign in at the crib station: a working badge and a PIN. */
export function StationState({ person }: { person: Person }) {
  return (
    <div className="flex flex-wrap gap-1">
      <span className={chip(person.hasBadge)}>{person.hasBadge ? 'Badge' : 'No badge'}</span>
      <span className={chip(person.hasPin)}>{person.hasPin ? 'PIN set' : 'No PIN'}</span>
    </div>
  );
}

/**
 * Printing a badge happens on Labels (the badge's token exists only when it is printed); a PIN is the
 * person's own, so a lead can only clear it, after confirming.
 */
export function StationActions({ person }: { person: Person }) {
  const clear = useClearPin();
  const [confirming, setConfirming] = useState(false);
  const clearPin = () =>
    clear.mutate(person.id, {
      onSuccess: () => toast.success(`${person.name}’s PIN is cleared; they set a new one on their Settings page.`),
      onError: (err) => toast.error(messageOf(err)),
      onSettled: () => setConfirming(false),
    });
  return (
    <div className="flex flex-wrap items-center gap-2">
      {person.active && (
        <Link
          to={`/labels?person=${person.id}`}
          aria-label={`Print badge for ${person.name}`}
          className="inline-flex min-h-12 items-center justify-center rounded-lg border-2 border-ink bg-card px-4 font-semibold hover:bg-paper"
        >
          Print badge
        </Link>
      )}
      {person.hasPin &&
        (confirming ? (
          <>
            <Button variant="danger" busy={clear.isPending} onClick={clearPin}>
              Confirm clear PIN
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Cancel
            </Button>
          </>
        ) : (
          <Button variant="secondary" onClick={() => setConfirming(true)}>
            Clear PIN
          </Button>
        ))}
    </div>
  );
}
