import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { actualWasteQueryOptions, planningSettingsQueryOptions } from '@/features/forecast/api/planning-settings';
import { WasteByMember } from '@/features/forecast/components/measured-waste';
import { PlanningSettingsForm } from '@/features/forecast/components/planning-settings-form';
import { PlanningSettingsView } from '@/features/forecast/components/planning-settings-view';
import { Card, PageHeader } from '@/components/ui/page';
import { requireSignedIn } from './guards';

export const planningSettingsLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const me = await requireSignedIn(queryClient, request);
  await Promise.all([
    queryClient.ensureQueryData(planningSettingsQueryOptions()),
    hasRole(me.role, 'lead') ? queryClient.ensureQueryData(actualWasteQueryOptions()) : null,
  ]);
  return null;
};

/** Only the lead fetches measured waste: it is theirs to act on. */
function LeadSettings() {
  const { data: settings } = useSuspenseQuery(planningSettingsQueryOptions());
  const { data: waste } = useSuspenseQuery(actualWasteQueryOptions());
  return (
    <div className="flex flex-col gap-4">
      <Card>
        <PlanningSettingsForm settings={settings} waste={waste} />
      </Card>
      <Card title="Waste by member">
        <p className="mb-3 text-sm text-steel">Drawn against estimated on finished assemblies.</p>
        <WasteByMember waste={waste} />
      </Card>
    </div>
  );
}

export function PlanningSettingsRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: settings } = useSuspenseQuery(planningSettingsQueryOptions());
  const isLead = !!me && hasRole(me.role, 'lead');
  return (
    <>
      <PageHeader title="Planning settings" lead="The chapter's figures behind rivet estimates, safety stock and suggested orders." />
      {isLead ? (
        <LeadSettings />
      ) : (
        <Card>
          <p className="mb-2 text-sm text-steel">Only the chapter lead changes these.</p>
          <PlanningSettingsView settings={settings} />
        </Card>
      )}
    </>
  );
}
