import { ROLE_ABILITIES, ROLE_LABELS } from '@shared/roles';
import type { User } from '@shared/schemas/auth';
import { Card, Code } from '@/components/ui/page';

/** Who is signed in and what their role lets them do. */
export function RoleSummary({ user }: { user: User }) {
  return (
    <Card title="You">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-steel">Name</dt>
        <dd className="font-medium">{user.name}</dd>
        <dt className="text-steel">E-mail</dt>
        <dd>
          <Code>{user.email}</Code>
        </dd>
        <dt className="text-steel">Role</dt>
        <dd className="font-medium">{ROLE_LABELS[user.role]}</dd>
      </dl>
      <h3 className="mt-4 font-semibold">What your role may do</h3>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {ROLE_ABILITIES[user.role].map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ul>
    </Card>
  );
}
