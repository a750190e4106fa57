import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { toast } from 'sonner';
import type { LedgerEntry, Movement } from '@shared/schemas/bins';
import { MOVEMENT_LABELS } from '@shared/stock/kinds';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Card, ItemCode } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { useReverse } from '../api/bin-actions';
import { ledgerQueryOptions } from '../api/get-ledger';
import { slipUrl } from '../api/upload-slip';
import { formatAssembly } from '@/lib/format';
import { formatCount, formatDateTime, formatSigned, formatUnitCost } from '../utils/format';
import { formatSignedCents } from '../utils/value';

/** A reversal undoes an entry once; a reversal is not itself reversed, and a count that changed nothing has nothing to undo. */
export const canReverse = (m: Pick<Movement, 'kind' | 'reversedById' | 'quantity'>) => m.kind !== 'reversal' && m.reversedById === null && !(m.kind === 'count' && m.quantity === 0);

const entryAnchor = (id: number) => `entry-${id}`;

function EntryLink({ id, words }: { id: number; words: string }) {
  return (
    <a href={`#${entryAnchor(id)}`} className="inline-flex min-h-12 items-center underline underline-offset-4">
      {words} #{id}
    </a>
  );
}

function ReverseEntry({ code, entry }: { code: string; entry: Pick<Movement, 'id' | 'quantity'> }) {
  const reverse = useReverse();
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const [problem, setProblem] = useState<string>();

  if (!open) {
    return (
      <Button variant="quiet" className="self-start px-0" onClick={() => setOpen(true)} aria-label={`Reverse entry #${entry.id}`}>
        Reverse
      </Button>
    );
  }
  const run = () => {
    setProblem(undefined);
    reverse.mutate(
      { code, id: entry.id, body: { note } },
      {
        onSuccess: (r) => {
          toast.success(`Entry #${entry.id} reversed by #${r.id}.`);
          setOpen(false);
          setNote('');
        },
        onError: (err) => setProblem(messageOf(err)),
      },
    );
  };
  return (
    <div className="mt-2 flex flex-col gap-2 rounded-lg border border-rule p-3">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <TextField label={`Why reverse entry #${entry.id}?`} value={note} onChange={(e) => setNote(e.target.value)} autoFocus />
      <p className="text-sm text-steel">A reversing entry of {formatSigned(-entry.quantity)} is added; nothing is deleted.</p>
      <div className="flex flex-wrap gap-2">
        <Button variant="danger" onClick={run} busy={reverse.isPending} disabled={!note.trim()}>
          Reverse #{entry.id}
        </Button>
        <Button variant="quiet" onClick={() => setOpen(false)}>
          Keep it
        </Button>
      </div>
    </div>
  );
}

/** Who made the entry and for whom; another person's entry, as a member sees it, names no one. */
function whoWords(m: LedgerEntry): string {
  if (!m.actor) return 'another person';
  const forSomeoneElse = m.member && m.member.id !== m.actor.id;
  return `${m.actor.name}${forSomeoneElse ? ` for ${m.member!.name}` : ''}`;
}

function LedgerItem({ code, entry: m, isQuartermaster }: { code: string; entry: LedgerEntry; isQuartermaster: boolean }) {
  return (
    <li id={entryAnchor(m.id)} className="flex flex-col gap-0.5 py-3">
      <div className="flex flex-wrap items-baseline justify-between gap-x-3">
        <p className="font-medium">
          {MOVEMENT_LABELS[m.kind]}{' '}
          <span className="font-mono">
            {formatSigned(m.quantity)}
          </span>
          {m.otherBinCode && (
            <span className="font-normal text-steel">
              {' '}
              {m.kind === 'transfer_out' ? 'to' : 'from'} <ItemCode code={m.otherBinCode} />
            </span>
          )}
        </p>
        <p className="font-mono text-sm">
          balance {formatCount(m.balanceAfter)}
          {m.valueCents !== null && <> · {formatSignedCents(m.valueCents)}</>}
        </p>
      </div>
      <p className="text-sm text-steel">
        #{m.id} · {formatDateTime(m.at)} · {whoWords(m)}
        {m.station && ` at ${m.station}`}
        {m.assembly && ` for ${formatAssembly(m.assembly)}`}
        {m.unitCost !== null && ` · at ${formatUnitCost(m.unitCost)}`}
      </p>
      {m.note && <p className="text-sm">{m.note}</p>}
      {(m.reversesId !== null || m.reversedById !== null || (m.slipId !== null && isQuartermaster)) && (
        <p className="flex flex-wrap gap-x-4 text-sm">
          {m.reversesId !== null && <EntryLink id={m.reversesId} words="reverses" />}
          {m.reversedById !== null && <EntryLink id={m.reversedById} words="reversed by" />}
          {m.slipId !== null && isQuartermaster && (
            <a href={slipUrl(m.slipId)} target="_blank" rel="noreferrer" className="inline-flex min-h-12 items-center underline underline-offset-4">
              Packing slip
            </a>
          )}
        </p>
      )}
      {isQuartermaster && canReverse(m) && <ReverseEntry code={code} entry={m} />}
    </li>
  );
}

/** The bin's ledger, newest first: every change of quantity with who, when, why and its value (a member sees only their own entries' who and value). */
export function LedgerList({ code, isQuartermaster }: { code: string; isQuartermaster: boolean }) {
  const ledger = useQuery(ledgerQueryOptions(code));
  return (
    <Card title="Ledger">
      {ledger.isPending && <p>Loading…</p>}
      {ledger.isError && <Notice tone="bad">{messageOf(ledger.error)}</Notice>}
      {ledger.data?.length === 0 && <p className="text-steel">Nothing has moved in or out of this bin yet.</p>}
      <ol className="flex flex-col divide-y divide-rule">
        {ledger.data?.map((m) => (
          <LedgerItem key={m.id} code={code} entry={m} isQuartermaster={isQuartermaster} />
        ))}
      </ol>
    </Card>
  );
}
