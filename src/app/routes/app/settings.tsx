import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { StationPinCard } from '@/features/auth/components/station-pin-card';
import { actualWasteQueryOptions, planningSettingsQueryOptions } from '@/features/forecast/api/planning-settings';
import { WasteByMember } from '@/features/forecast/components/measured-waste';
import { PlanningSettingsForm } from '@/features/forecast/components/planning-settings-form';
import { PlanningSettingsView } from '@/features/forecast/components/planning-settings-view';
import { paymentSettingsQueryOptions } from '@/features/payments/api/get-payment-settings';
import { PaymentSettingsCard } from '@/features/payments/components/payment-settings-card';
import { cribSettingsQueryOptions } from '@/features/signoffs/api/get-crib-settings';
import { HoldTimeCard } from '@/features/signoffs/components/hold-time-card';
import { TimeZoneCard } from '@/features/signoffs/components/time-zone-card';
import { Card, PageHeader } from '@/components/ui/page';
import { loadAlongside, requireSignedIn } from './guards';

export const settingsLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const guard = requireSignedIn(queryClient, request);
  await loadAlongside(
    guard,
    Promise.all([
      queryClient.ensureQueryData(planningSettingsQueryOptions()),
      queryClient.ensureQueryData(cribSettingsQueryOptions()),
      queryClient.ensureQueryData(paymentSettingsQueryOptions()),
      // Only a lead sees the measured waste: that request waits to know who is signed in.
      guard.then((me) => (hasRole(me.role, 'lead') ? queryClient.ensureQueryData(actualWasteQueryOptions()) : null)),
    ]),
  );
  return null;
};

/** The planning settings had a page of their own: an old bookmark lands on Settings. */
export const planningSettingsRedirect = () => redirect('/settings');

/** Only the lead fetches measured waste: it is theirs to act on. */
function LeadPlanning() {
  const { data: settings } = useSuspenseQuery(planningSettingsQueryOptions());
  const { data: waste } = useSuspenseQuery(actualWasteQueryOptions());
  return (
    <>
      <Card title="Planning">
        <PlanningSettingsForm settings={settings} waste={waste} />
      </Card>
      <Card title="Waste by member">
        <p className="mb-3 text-sm text-steel">Drawn against estimated on finished assemblies.</p>
        <WasteByMember waste={waste} />
      </Card>
    </>
  );
}

/**
 * The chapter's settings in one place: the figures behind estimates and orders, how long a returned
 * tool is held, the chapter's clock, and whether members may pay their tab online. Everyone may read them; only a chapter lead gets the forms,
 * as only a lead may change them on the server.
 */
export function SettingsRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: planning } = useSuspenseQuery(planningSettingsQueryOptions());
  const { data: crib } = useSuspenseQuery(cribSettingsQueryOptions());
  const { data: payments } = useSuspenseQuery(paymentSettingsQueryOptions());
  const isLead = !!me && hasRole(me.role, 'lead');
  return (
    <>
      <PageHeader
        title="Settings"
        lead={
          isLead
            ? 'The chapter’s figures behind rivet estimates and suggested orders, how long a returned tool is held, the chapter’s clock and online payment.'
            : 'The chapter’s figures behind rivet estimates and suggested orders, how long a returned tool is held, the chapter’s clock and online payment. Only the chapter lead changes them.'
        }
      />
      <div className="flex flex-col gap-4">
        {isLead ? (
          <LeadPlanning />
        ) : (
          <Card title="Planning">
            <PlanningSettingsView settings={planning} />
          </Card>
        )}
        <HoldTimeCard holdHours={crib.holdHours} canChange={isLead} />
        <TimeZoneCard timeZone={crib.timeZone} canChange={isLead} />
        <PaymentSettingsCard settings={payments} canChange={isLead} />
        <StationPinCard />
      </div>
    </>
  );
}
