import { useState } from 'react';
import { toast } from 'sonner';
import type { ToolForYou } from '@shared/schemas/tools';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useCheckOut } from '../api/tool-actions';
import { formatDueDay } from '@/lib/format';

const toDateInput = (iso: string) => iso.slice(0, 10);

/** Check out with the loan period's due date (editable) and the accessories listed so nothing stays behind. */
export function CheckoutForm({ tool, onDone }: { tool: ToolForYou; onDone?: () => void }) {
  const checkOut = useCheckOut();
  const [due, setDue] = useState(toDateInput(tool.forYou.defaultDueAt));
  const [ticked, setTicked] = useState<string[]>([]);
  const [problem, setProblem] = useState<string>();

  const submit = () => {
    setProblem(undefined);
    // The due moment is the end of the chosen day, local time.
    const dueAt = due === toDateInput(tool.forYou.defaultDueAt) ? undefined : new Date(`${due}T23:59:00`).toISOString();
    checkOut.mutate(
      { code: tool.code, body: dueAt ? { dueAt } : {} },
      {
        onSuccess: (loan) => {
          toast.success(`${tool.code} is yours until ${formatDueDay(loan.dueAt)}.`);
          onDone?.();
        },
        onError: (err) => setProblem(messageOf(err)),
      },
    );
  };

  return (
    <div className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <TextField label="Bring it back by" type="date" value={due} min={toDateInput(new Date().toISOString())} onChange={(e) => setDue(e.target.value)} />
      {tool.accessories.length > 0 && (
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-semibold">Take these with it</legend>
          {tool.accessories.map((a) => (
            <label key={a} className="flex min-h-12 items-center gap-3">
              <input
                type="checkbox"
                className="size-6 accent-ink"
                checked={ticked.includes(a)}
                onChange={(e) => setTicked(e.target.checked ? [...ticked, a] : ticked.filter((x) => x !== a))}
              />
              {a}
            </label>
          ))}
        </fieldset>
      )}
      <Button onClick={submit} busy={checkOut.isPending} className="w-full text-lg">
        Check out {tool.code}
      </Button>
    </div>
  );
}
