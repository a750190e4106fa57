import { useState } from 'react';
import { toast } from 'sonner';
import { ROLE_LABELS, ROLES, type Role } from '@shared/roles';
import type { Person, UpdatePersonBody } from '@shared/schemas/people';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/lib/errors';
import { useUpdatePerson } from '../api/update-person';

/** Role change and deactivate / reactivate for one person; deactivation asks to confirm first. */
export function PersonActions({ person, isSelf }: { person: Person; isSelf: boolean }) {
  const update = useUpdatePerson();
  const [confirming, setConfirming] = useState(false);

  const change = (body: UpdatePersonBody, done: string) =>
    update.mutate(
      { id: person.id, change: body },
      {
        onSuccess: () => toast.success(done),
        onError: (err) => toast.error(messageOf(err)),
        onSettled: () => setConfirming(false),
      },
    );

  return (
    <div className="flex flex-wrap items-center gap-2">
      <label className="sr-only" htmlFor={`role-${person.id}`}>
        Role of {person.name}
      </label>
      <select
        id={`role-${person.id}`}
        value={person.role}
        disabled={update.isPending || !person.active}
        onChange={(e) => change({ role: e.target.value as Role }, `${person.name} is now ${ROLE_LABELS[e.target.value as Role].toLowerCase()}.`)}
        className="min-h-11 rounded-lg border-2 border-rule bg-card px-2"
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </select>
      {person.active ? (
        isSelf ? null : confirming ? (
          <>
            <Button variant="danger" busy={update.isPending} onClick={() => change({ active: false }, `${person.name} can no longer sign in; their holds and queue places have ended.`)}>
              Confirm deactivate
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Cancel
            </Button>
          </>
        ) : (
          <Button variant="secondary" onClick={() => setConfirming(true)}>
            Deactivate
          </Button>
        )
      ) : (
        <Button variant="secondary" busy={update.isPending} onClick={() => change({ active: true }, `${person.name} can sign in again.`)}>
          Reactivate
        </Button>
      )}
    </div>
  );
}
