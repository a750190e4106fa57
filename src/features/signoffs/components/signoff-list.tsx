import type { Signoff } from '@shared/schemas/signoffs';
import { Card } from '@/components/ui/page';
import type { Candidate } from './grant-signoff-form';
import { SignoffCard } from './signoff-card';

/** Every sign-off with its holders; `people` are the active people a lead may sign off. */
export function SignoffList({ signoffs, people }: { signoffs: Signoff[]; people: Candidate[] }) {
  if (signoffs.length === 0) {
    return (
      <Card>
        <p className="text-steel">No sign-offs yet. Define one, such as Air tools, then mark the tools that need it.</p>
      </Card>
    );
  }
  return (
    <div className="flex flex-col gap-4">
      {signoffs.map((s) => (
        <SignoffCard key={s.id} signoff={s} people={people} />
      ))}
    </div>
  );
}
