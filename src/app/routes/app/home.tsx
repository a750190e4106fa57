import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { lazy, Suspense } from 'react';
import { Link } from 'react-router';
import { hasRole, ROLE_LABELS, ROLES } from '@shared/roles';
import type { User } from '@shared/schemas/auth';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { RoleSummary } from '@/features/auth/components/role-summary';
import { MySignoffs } from '@/features/signoffs/components/my-signoffs';
import { invitationsQueryOptions } from '@/features/people/api/get-invitations';
import { peopleQueryOptions } from '@/features/people/api/get-people';
import { Notice } from '@/components/ui/notice';
import { Card, PageHeader } from '@/components/ui/page';

// Each role's "what needs you today" loads with its own chunk, outside the first-load budget.
const MemberToday = lazy(() => import('./home/member-today').then((m) => ({ default: m.MemberToday })));
const QuartermasterToday = lazy(() => import('./home/quartermaster-today').then((m) => ({ default: m.QuartermasterToday })));
const LeadToday = lazy(() => import('./home/lead-today').then((m) => ({ default: m.LeadToday })));

function ChapterAtAGlance() {
  const people = useQuery(peopleQueryOptions());
  const invitations = useQuery(invitationsQueryOptions());
  if (!people.data) return null;
  const active = people.data.filter((p) => p.active);
  return (
    <Card title="The chapter at a glance">
      <dl className="grid grid-cols-2 gap-3">
        {ROLES.map((role) => (
          <div key={role} className="rounded-lg bg-paper p-3">
            <dt className="text-sm text-steel">{ROLE_LABELS[role]}s</dt>
            <dd className="font-mono text-2xl font-medium">{active.filter((p) => p.role === role).length}</dd>
          </div>
        ))}
        <div className="rounded-lg bg-paper p-3">
          <dt className="text-sm text-steel">Invitations waiting</dt>
          <dd className="font-mono text-2xl font-medium">{invitations.data?.length ?? '…'}</dd>
        </div>
      </dl>
      <p className="mt-3">
        <Link to="/people" className="inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
          Invite someone or change a role
        </Link>
      </p>
    </Card>
  );
}

function SafetyNotes({ user }: { user: User }) {
  return (
    <Notice tone="warn" title="Before you pick up a tool">
      <ul className="list-disc space-y-1 pl-5">
        <li>Powered tools need eye and hearing protection, and a sign-off from the chapter before first use.</li>
        <li>
          Gripline plans tools and stock; it does not design structures. The kit's plans and the maker's instructions govern rivet
          choice, edge distance and drill sizes; for certificated aircraft, approved data and a licensed mechanic or inspector do.
          Follow local codes and rules.
        </li>
        {hasRole(user.role, 'quartermaster') && <li>Label every tool and bin before it goes on the shelf.</li>}
      </ul>
    </Notice>
  );
}

export function HomeRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  if (!me) return null;
  return (
    <>
      <PageHeader title={`Hello, ${me.name.split(' ')[0]}`} tabTitle="Home" lead="What needs you today, then the way in." />
      <p className="mb-5">
        <Link
          to="/scan"
          className="flex min-h-14 w-full items-center justify-center rounded-xl bg-ink px-8 text-lg font-bold text-card shadow-sm hover:bg-ink-soft sm:inline-flex sm:w-auto sm:min-w-72"
        >
          Scan a label
        </Link>
      </p>
      <Suspense fallback={null}>
        {me.role === 'lead' && <LeadToday />}
        {me.role === 'quartermaster' && <QuartermasterToday />}
        <MemberToday />
      </Suspense>
      <div className="grid gap-4 lg:grid-cols-2">
        <RoleSummary user={me} />
        {hasRole(me.role, 'lead') ? <ChapterAtAGlance /> : null}
        <SafetyNotes user={me} />
        <MySignoffs />
      </div>
    </>
  );
}
