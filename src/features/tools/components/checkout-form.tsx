import { useState } from 'react';
import type { ToolForYou } from '@shared/schemas/tools';
import { AccessoryChecklist } from '@/components/ui/accessory-checklist';
import { chapterDay, endOfChapterDay, startOfDayNamed } from '@shared/time/chapter-time';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ToolCautions } from '@/components/ui/tool-cautions';
import { messageOf } from '@/lib/errors';
import { chapterTimeZone } from '@/lib/chapter-zone';
import { formatDueDay } from '@/lib/format';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { useCheckOut } from '../api/tool-actions';

/** The chapter day a moment falls on, as a date field holds it. */
const toDateInput = (at: string | Date) => chapterDay(new Date(at), chapterTimeZone());

/** Check out with the loan period's due date (editable) and the accessories listed so nothing stays behind. */
export function CheckoutForm({ tool, onDone }: { tool: ToolForYou; onDone?: ActionDone }) {
  const checkOut = useCheckOut();
  const [due, setDue] = useState(toDateInput(tool.forYou.defaultDueAt));
  const [ticked, setTicked] = useState<string[]>([]);
  const [problem, setProblem] = useState<string>();
  const missing = tool.missingAccessories.map((m) => m.accessory);
  const takeable = tool.accessories.filter((a) => !missing.includes(a));

  const submit = () => {
    setProblem(undefined);
    // A chosen day is due by its end on the chapter's calendar, as the loan period's default is.
    const zone = chapterTimeZone();
    const dueAt = due === toDateInput(tool.forYou.defaultDueAt) ? undefined : endOfChapterDay(startOfDayNamed(due, zone), zone).toISOString();
    checkOut.mutate(
      { code: tool.code, body: { ...(dueAt && { dueAt }), ...(takeable.length > 0 && { accessories: ticked }) } },
      {
        onSuccess: (loan) => {
          const said = `${tool.code} is yours until ${formatDueDay(loan.dueAt)}.`;
          confirmDone(said, onDone);
        },
        onError: (err) => setProblem(messageOf(err)),
      },
    );
  };

  return (
    <div className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <TextField label="Bring it back by" type="date" value={due} min={toDateInput(new Date())} onChange={(e) => setDue(e.target.value)} />
      {takeable.length > 0 && (
        <AccessoryChecklist legend="Tick what you take with it" items={takeable} ticked={ticked} onChange={setTicked} />
      )}
      {missing.length > 0 && <p className="text-sm text-steel">Missing from the crib: {missing.join(', ')}.</p>}
      <ToolCautions categories={[tool.category]} />
      <Button onClick={submit} busy={checkOut.isPending} className="w-full text-lg">
        Check out {tool.code}
      </Button>
    </div>
  );
}
