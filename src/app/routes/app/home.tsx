import { useSuspenseQuery } from '@tanstack/react-query';
import { lazy, Suspense } from 'react';
import { Link } from 'react-router';
import { hasRole } from '@shared/roles';
import type { User } from '@shared/schemas/auth';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { RoleSummary } from '@/features/auth/components/role-summary';
import { MySignoffs } from '@/features/signoffs/components/my-signoffs';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';

// Each role's "what needs you today" loads with its own chunk, outside the first-load budget.
const MemberToday = lazy(() => import('./home/member-today').then((m) => ({ default: m.MemberToday })));
const QuartermasterToday = lazy(() => import('./home/quartermaster-today').then((m) => ({ default: m.QuartermasterToday })));
const LeadToday = lazy(() => import('./home/lead-today').then((m) => ({ default: m.LeadToday })));

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
        <SafetyNotes user={me} />
        <MySignoffs />
      </div>
    </>
  );
}
