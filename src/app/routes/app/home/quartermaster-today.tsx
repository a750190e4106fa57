import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { QuartermasterToday as Today } from '@shared/schemas/today-quartermaster';
import { quartermasterTodayQueryOptions } from '@/features/today/api/get-quartermaster-today';
import { Card, ItemCode } from '@/components/ui/page';
import { formatCents, formatCount, formatDate, formatDateTime, formatDay, formatQuantity } from '@/lib/format';

/** A line of a home list: the whole line is the link to where it is dealt with (44 px or more to tap). */
function ItemLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <li>
      <Link to={to} className="flex min-h-12 flex-col justify-center rounded-md py-2 underline-offset-4 hover:bg-paper hover:underline">
        {children}
      </Link>
    </li>
  );
}

function Items({ children }: { children: ReactNode }) {
  return <ul className="divide-y divide-rule">{children}</ul>;
}

function MoreLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <p className="mt-2">
      <Link to={to} className="inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
        {children}
      </Link>
    </p>
  );
}

function Line({ code, title, detail }: { code: string; title: string; detail: ReactNode }) {
  return (
    <>
      <span className="font-medium">
        <ItemCode code={code} /> · {title}
      </span>
      <span className="text-sm text-ink-soft">{detail}</span>
    </>
  );
}

function WhatToOrder({ toOrder }: { toOrder: Today['toOrder'] }) {
  return (
    <Card title="What to order">
      {toOrder.bins === 0 ? (
        <p>Nothing to order: every bin has enough on hand or on its way.</p>
      ) : (
        <>
          <p>
            <Link to="/alerts#purchase-list" className="inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
              {formatQuantity(toOrder.bins, 'bin')} to order, about {formatCents(toOrder.totalCents)}
            </Link>
          </p>
          <Items>
            {toOrder.top.map((l) => (
              <ItemLink key={l.code} to="/alerts#purchase-list">
                <Line code={l.code} title={l.designation} detail={`Order ${formatQuantity(l.quantity, l.unit)}, ${formatCents(l.costCents)}`} />
              </ItemLink>
            ))}
          </Items>
          {toOrder.bins > toOrder.top.length && <MoreLink to="/alerts#purchase-list">All {formatCount(toOrder.bins)} on the purchase list</MoreLink>}
        </>
      )}
    </Card>
  );
}

function Deliveries({ deliveries }: { deliveries: Today['deliveries'] }) {
  const { late, expected, withinDays } = deliveries;
  const line = (d: Today['deliveries']['late'][number], isLate: boolean) => (
    <ItemLink key={d.alertId} to="/alerts">
      <Line
        code={d.code}
        title={d.designation}
        detail={
          <>
            {formatQuantity(d.quantity, d.unit)} on order, {isLate ? <strong className="text-bad">{d.words}</strong> : d.words} (expected {formatDay(d.expectedAt)})
          </>
        }
      />
    </ItemLink>
  );
  return (
    <Card title="Deliveries this week">
      {late.length === 0 && expected.length === 0 ? (
        <p>No order is late, and none is expected in the next {withinDays} days.</p>
      ) : (
        <Items>
          {late.map((d) => line(d, true))}
          {expected.map((d) => line(d, false))}
        </Items>
      )}
      <MoreLink to="/alerts">Orders on the Reorder alerts page</MoreLink>
    </Card>
  );
}

function ReturnsAndAccessories({ returns, missing }: { returns: Today['returnsNeedingAttention']; missing: Today['missingAccessories'] }) {
  return (
    <Card title="Returns needing attention">
      {returns.length === 0 && missing.length === 0 ? (
        <p>No tool came back needing attention, and no accessory is missing.</p>
      ) : (
        <Items>
          {returns.map((r) => (
            <ItemLink key={`r-${r.code}`} to={`/tools/${r.code}`}>
              <Line code={r.code} title={r.name} detail={`Needs attention: ${r.note || 'no note'} (back from ${r.returnedBy}, ${formatDate(r.returnedAt)})`} />
            </ItemLink>
          ))}
          {missing.map((m) => (
            <ItemLink key={`m-${m.code}`} to={`/tools/${m.code}`}>
              <Line code={m.code} title={m.name} detail={`Missing: ${m.items.map((i) => `${i.accessory} (not back from ${i.lastHolder})`).join('; ')}`} />
            </ItemLink>
          ))}
        </Items>
      )}
    </Card>
  );
}

function ServiceDue({ service }: { service: Today['serviceDue'] }) {
  return (
    <Card title="Service and calibration due">
      {service.total === 0 ? (
        <p>No service or calibration is due in the next {service.withinDays} days.</p>
      ) : (
        <>
          <Items>
            {service.top.map((s) => (
              <ItemLink key={s.code} to="/service">
                <Line code={s.code} title={s.name} detail={s.overdue ? <strong className="text-bad">{s.words}</strong> : s.words} />
              </ItemLink>
            ))}
          </Items>
          <MoreLink to="/service">{service.total > service.top.length ? `All ${formatCount(service.total)} on the service list` : 'The service list'}</MoreLink>
        </>
      )}
    </Card>
  );
}

function BinsToCount({ count }: { count: Today['binsToCount'] }) {
  return (
    <Card title="Bins to count today">
      <p className="text-sm text-ink-soft">{count.rule}</p>
      {count.bins.length === 0 ? (
        <p className="mt-2">There are no bins to count yet.</p>
      ) : (
        <Items>
          {count.bins.map((b) => (
            <ItemLink key={b.code} to={`/bins/${b.code}`}>
              <Line
                code={b.code}
                title={b.designation}
                detail={`${formatQuantity(b.onHand, b.unit)}, ${formatCents(b.valueCents)}; ${b.lastCountedAt ? `last counted ${formatDate(b.lastCountedAt)}` : 'never counted'}`}
              />
            </ItemLink>
          ))}
        </Items>
      )}
    </Card>
  );
}

function WriteOffs({ writeOffs }: { writeOffs: Today['writeOffs'] }) {
  return (
    <Card title="Recent write-offs">
      {writeOffs.entries.length === 0 ? (
        <p>Nothing was written off in the last {writeOffs.withinDays} days.</p>
      ) : (
        <Items>
          {writeOffs.entries.map((w) => (
            <ItemLink key={w.id} to={`/bins/${w.code}`}>
              <Line code={w.code} title={w.designation} detail={`${formatQuantity(w.quantity, w.unit)} by ${w.by}, ${formatDateTime(w.at)}${w.note ? `: ${w.note}` : ''}`} />
            </ItemLink>
          ))}
        </Items>
      )}
    </Card>
  );
}

/** The quartermaster's part of home: what needs them today, each line a link to where it is dealt with. */
export function QuartermasterToday() {
  const today = useQuery(quartermasterTodayQueryOptions());
  if (today.isPending) return <p className="mb-4 text-steel">Loading what needs you today…</p>;
  if (today.isError) return <p className="mb-4 text-bad">What needs you today could not be loaded. {today.error.message}</p>;
  const d = today.data;
  return (
    <div className="mb-4 grid gap-4 lg:grid-cols-2" data-testid="quartermaster-today">
      <WhatToOrder toOrder={d.toOrder} />
      <Deliveries deliveries={d.deliveries} />
      <ReturnsAndAccessories returns={d.returnsNeedingAttention} missing={d.missingAccessories} />
      <ServiceDue service={d.serviceDue} />
      <BinsToCount count={d.binsToCount} />
      <WriteOffs writeOffs={d.writeOffs} />
    </div>
  );
}
