import { useState } from 'react';
import { toast } from 'sonner';
import type { Person } from '@shared/schemas/people';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { messageOf } from '@/lib/errors';
import { useClearPin } from '../api/clear-pin';

const looks = (on: boolean) => (on ? 'bg-ok-soft text-ok' : 'bg-paper text-steel');

/** Whether the person can sign in at the crib station: a working badge and a PIN. */
export function StationState({ person }: { person: Person }) {
  return (
    <div className="flex flex-wrap gap-1">
      <Badge className={looks(person.hasBadge)}>{person.hasBadge ? 'Badge' : 'No badge'}</Badge>
      <Badge className={looks(person.hasPin)}>{person.hasPin ? 'PIN set' : 'No PIN'}</Badge>
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
        <LinkButton variant="secondary" to={`/labels?person=${person.id}`} aria-label={`Print badge for ${person.name}`}>
          Print badge
        </LinkButton>
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
