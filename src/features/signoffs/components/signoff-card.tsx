import { useId, useState } from 'react';
import type { Signoff } from '@shared/schemas/signoffs';
import { Button } from '@/components/ui/button';
import { toolCountWords } from './format';
import { GrantSignoffForm, type Candidate } from './grant-signoff-form';
import { HolderList } from './holder-list';
import { SignoffForm } from './signoff-form';

/** One sign-off: what it covers, who holds it, and a form to sign one more person off. */
export function SignoffCard({ signoff, people }: { signoff: Signoff; people: Candidate[] }) {
  const [editing, setEditing] = useState(false);
  const headingId = useId();
  const holderIds = new Set(signoff.holders.map((h) => h.userId));
  const candidates = people.filter((p) => !holderIds.has(p.id));

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4 rounded-xl border border-rule bg-card p-4 shadow-sm sm:p-5">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h2 id={headingId} className="text-lg font-semibold">
            {signoff.name}
          </h2>
          <p className="text-sm text-steel">
            {toolCountWords(signoff.toolCount)} · {signoff.holders.length} signed off
          </p>
          {signoff.description && <p className="mt-1">{signoff.description}</p>}
        </div>
        {!editing && (
          <Button variant="quiet" aria-label={`Edit ${signoff.name}`} onClick={() => setEditing(true)}>
            Edit
          </Button>
        )}
      </header>
      {editing && <SignoffForm signoff={signoff} onDone={() => setEditing(false)} />}
      <div>
        <h3 className="font-semibold">Signed off</h3>
        <HolderList signoff={signoff} />
      </div>
      <GrantSignoffForm signoff={signoff} candidates={candidates} />
    </section>
  );
}
