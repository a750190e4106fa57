import { useQuery } from '@tanstack/react-query';
import { Fragment, type ReactNode } from 'react';
import { Link } from 'react-router';
import type { MemberToday as Today, MemberTodayAssembly, MemberTodayHold } from '@shared/schemas/today-member';
import { memberTodayQueryOptions } from '@/features/today/api/get-member-today';
import { DueStateBadge } from '@/features/tools/components/due-badge';
import { Card, ItemCode } from '@/components/ui/page';
import { formatAssembly, formatCents, formatCount, formatDateTime } from '@/lib/format';

const ITEM_LINK = 'inline-flex min-h-11 items-center gap-2 font-semibold underline underline-offset-4';
const ALL_LINK = 'mt-2 inline-flex min-h-11 items-center font-semibold underline underline-offset-4';

/** A home section: a heading, a short list or one sentence when there is nothing, and a link to all of them. */
const LOANS_EMPTY = 'You have nothing from the crib.';
const SET_ASIDE_EMPTY = 'Nothing is set aside for you.';
const QUEUE_EMPTY = 'You are not in line for any tool.';
const ASSEMBLIES_EMPTY = 'No assembly of yours is in progress.';
const ATTENTION_EMPTY = 'Nothing you returned for attention is still waiting.';

function Section({ title, total, shown, all, children }: { title: string; total: number; shown: number; all?: { to: string; words: (n: string) => string }; children: ReactNode }) {
  return (
    <Card title={title}>
      <ul className="flex flex-col divide-y divide-rule">{children}</ul>
      {all && total > shown && (
        <Link to={all.to} className={ALL_LINK}>
          {all.words(formatCount(total))}
        </Link>
      )}
    </Card>
  );
}

function ToolLink({ tool }: { tool: { code: string; name: string } }) {
  return (
    <Link to={`/tools/${tool.code}`} className={ITEM_LINK}>
      <ItemCode code={tool.code} className="text-brass-deep" />
      <span>{tool.name}</span>
    </Link>
  );
}

function Loans({ loans }: { loans: Today['loans'] }) {
  return (
    <Section title="Out with you" total={loans.total} shown={loans.items.length} all={{ to: '/loans', words: (n) => `All ${n} of your loans` }}>
      {loans.items.map((l) => (
        <li key={l.loanId} className="py-2">
          <ToolLink tool={l.tool} />
          <p className="flex flex-wrap items-center gap-2 text-sm">
            <span>back by {l.dueDay}</span>
            <DueStateBadge due={{ words: l.dueWords, overdue: l.overdue, soon: l.soon }} />
          </p>
        </li>
      ))}
    </Section>
  );
}

function Holds({ title, holds }: { title: string; holds: Today['setAside'] }) {
  return (
    <Section title={title} total={holds.total} shown={holds.items.length}>
      {holds.items.map((h: MemberTodayHold) => (
        <li key={h.tool.code} className="py-2">
          <ToolLink tool={h.tool} />
          <p className="text-sm">{h.words}</p>
        </li>
      ))}
    </Section>
  );
}

/** One thing an assembly lacks, linked to the page where it is dealt with when there is one. */
function LackLine({ what, to, words }: { what: string; to: string | null; words: string }) {
  return (
    <li>
      {to ? (
        <Link to={to} className="inline-flex min-h-11 items-center font-medium underline underline-offset-4">
          {what}
        </Link>
      ) : (
        <span className="font-medium">{what}</span>
      )}
      : {words}
    </li>
  );
}

function Lacks({ assembly }: { assembly: MemberTodayAssembly }) {
  if (assembly.tools.length === 0 && assembly.bins.length === 0) return <p className="text-sm text-ok">Its kit is ready: every tool free for you, every bin stocked.</p>;
  return (
    <ul className="mt-1 flex flex-col gap-1 text-sm">
      {assembly.tools.map((k) => (
        <LackLine key={`tool ${k.need}`} what={k.need} to={k.tool && `/tools/${k.tool.code}`} words={k.words} />
      ))}
      {assembly.bins.map((b) => (
        <LackLine key={`bin ${b.description}`} what={b.description} to={b.binCode && `/bins/${b.binCode}`} words={b.words} />
      ))}
    </ul>
  );
}

function Assemblies({ assemblies }: { assemblies: Today['assemblies'] }) {
  return (
    <Section title="Your assemblies in progress" total={assemblies.total} shown={assemblies.items.length} all={{ to: '/builds', words: (n) => `All ${n} in My builds` }}>
      {assemblies.items.map((a) => (
        <li key={a.id} className="py-2">
          <Link to={`/assemblies/${a.id}`} className={ITEM_LINK}>
            {formatAssembly(a)}
          </Link>
          <Lacks assembly={a} />
        </li>
      ))}
    </Section>
  );
}

function Attention({ attention }: { attention: Today['attention'] }) {
  return (
    <Section title="Returned for attention" total={attention.total} shown={attention.items.length}>
      {attention.items.map((r) => (
        <li key={r.loanId} className="py-2">
          <ToolLink tool={r.tool} />
          <p className="text-sm">
            You returned it {formatDateTime(r.returnedAt)}
            {r.note ? `: ${r.note}` : ''}. Still out of service.
          </p>
        </li>
      ))}
    </Section>
  );
}

function tabWords(balanceCents: number): string {
  if (balanceCents > 0) return `You owe ${formatCents(balanceCents)} on your tab.`;
  if (balanceCents < 0) return `You have paid ${formatCents(-balanceCents)} ahead on your tab.`;
  return 'Your tab is settled.';
}

function TabLine({ balanceCents }: { balanceCents: number }) {
  return (
    <Link to="/tab" className={ITEM_LINK}>
      {tabWords(balanceCents)}
    </Link>
  );
}

const quietDay = (t: Today) => t.loans.total + t.setAside.total + t.queue.total + t.assemblies.total + t.attention.total === 0;

/** The member's part of home: what needs them today. Every role borrows, so every role sees it. */
export function MemberToday() {
  const today = useQuery(memberTodayQueryOptions());
  if (today.isPending) return <p className="mb-4 text-steel">Looking at your loans and holds…</p>;
  if (today.isError) return <p className="mb-4 text-steel">Your loans and holds could not be loaded just now: {today.error.message}</p>;
  const t = today.data;
  if (quietDay(t)) {
    return (
      <Card title="Your day" className="mb-4">
        <p>A clear bench: nothing from the crib is out with you and nothing waits for you.</p>
        <TabLine balanceCents={t.tab.balanceCents} />
      </Card>
    );
  }
  // Sections with something in them get a card each; the empty ones share one card of sentences.
  const parts: { key: string; total: number; empty: string; node: ReactNode }[] = [
    { key: 'loans', total: t.loans.total, empty: LOANS_EMPTY, node: <Loans loans={t.loans} /> },
    { key: 'set-aside', total: t.setAside.total, empty: SET_ASIDE_EMPTY, node: <Holds title="Set aside for you" holds={t.setAside} /> },
    { key: 'queue', total: t.queue.total, empty: QUEUE_EMPTY, node: <Holds title="Your places in line" holds={t.queue} /> },
    { key: 'assemblies', total: t.assemblies.total, empty: ASSEMBLIES_EMPTY, node: <Assemblies assemblies={t.assemblies} /> },
    { key: 'attention', total: t.attention.total, empty: ATTENTION_EMPTY, node: <Attention attention={t.attention} /> },
  ];
  const quiet = parts.filter((p) => p.total === 0);
  return (
    <div className="mb-4 grid gap-4 lg:grid-cols-2">
      {parts.filter((p) => p.total > 0).map((p) => <Fragment key={p.key}>{p.node}</Fragment>)}
      <Card title="My tab">
        <TabLine balanceCents={t.tab.balanceCents} />
        {quiet.length > 0 && (
          <ul className="mt-3 flex flex-col gap-1 border-t border-rule pt-3 text-steel">
            {quiet.map((p) => (
              <li key={p.key}>{p.empty}</li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
