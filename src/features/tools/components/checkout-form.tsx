import { useState } from 'react';
import { toast } from 'sonner';
import type { ToolForYou } from '@shared/schemas/tools';
import { AccessoryChecklist } from '@/components/ui/accessory-checklist';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useCheckOut } from '../api/tool-actions';
import { shortDate } from '../due-words';

const toDateInput = (iso: string) => iso.slice(0, 10);

/** Check out with the loan period's due date (editable) and the accessories listed so nothing stays behind. */
export function CheckoutForm({ tool, onDone }: { tool: ToolForYou; onDone?: () => void }) {
  const checkOut = useCheckOut();
  const [due, setDue] = useState(toDateInput(tool.forYou.defaultDueAt));
  const [ticked, setTicked] = useState<string[]>([]);
  const [problem, setProblem] = useState<string>();
  const missing = tool.missingAccessories.map((m) => m.accessory);
  const takeable = tool.accessories.filter((a) => !missing.includes(a));

  const submit = () => {
    setProblem(undefined);
    // The due moment is the end of the chosen day, local time.
    const dueAt = due === toDateInput(tool.forYou.defaultDueAt) ? undefined : new Date(`${due}T23:59:00`).toISOString();
    checkOut.mutate(
      { code: tool.code, body: { ...(dueAt && { dueAt }), ...(takeable.length > 0 && { accessories: ticked }) } },
      {
        onSuccess: (loan) => {
          toast.success(`${tool.code} is yours until ${shortDate.format(new Date(loan.dueAt))}.`);
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
      {takeable.length > 0 && (
        <AccessoryChecklist legend="Tick what you take with it" items={takeable} ticked={ticked} onChange={setTicked} />
      )}
      {missing.length > 0 && <p className="text-sm text-steel">Missing from the crib: {missing.join(', ')}.</p>}
      <Button onClick={submit} busy={checkOut.isPending} className="w-full text-lg">
        Check out {tool.code}
      </Button>
    </div>
  );
}
