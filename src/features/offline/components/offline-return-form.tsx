import { useState } from 'react';
import type { CatalogueTool } from '@shared/schemas/offline';
import { returnBodySchema } from '@shared/schemas/tools';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { queueFromCopy } from '../api/queue-from-copy';
import type { StoredCatalogue } from '../db';

/** Return from the copy: ok or needs attention (with a note), and the count for a temporary fastener tray. */
export function OfflineReturnForm({ copy, tool }: { copy: StoredCatalogue; tool: CatalogueTool }) {
  const isTray = tool.category === 'temporary_fastener_tray';
  const [condition, setCondition] = useState<'ok' | 'needs_attention'>('ok');
  const [note, setNote] = useState('');
  const [count, setCount] = useState(isTray && tool.trayCapacity ? String(tool.trayCapacity) : '');
  const [problem, setProblem] = useState<string>();
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    const parsed = returnBodySchema.safeParse({
      condition,
      ...(note.trim() && { note: note.trim() }),
      ...(isTray && { returnedCount: count === '' ? undefined : Number(count) }),
    });
    if (!parsed.success) return setProblem(parsed.error.issues[0]?.message);
    if (isTray && tool.trayCapacity !== null && (parsed.data.returnedCount ?? 0) > tool.trayCapacity) {
      return setProblem(`A full tray holds ${tool.trayCapacity}. Count again.`);
    }
    setProblem(undefined);
    setBusy(true);
    try {
      await queueFromCopy(copy, 'return', tool.code, tool.name, parsed.data);
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <fieldset className="flex flex-col gap-1">
        <legend className="text-sm font-semibold">How is it?</legend>
        <label className="flex min-h-12 items-center gap-3">
          <input type="radio" name="offline-condition" className="size-6 accent-ink" checked={condition === 'ok'} onChange={() => setCondition('ok')} />
          Works fine
        </label>
        <label className="flex min-h-12 items-center gap-3">
          <input
            type="radio"
            name="offline-condition"
            className="size-6 accent-ink"
            checked={condition === 'needs_attention'}
            onChange={() => setCondition('needs_attention')}
          />
          Needs attention
        </label>
      </fieldset>
      {isTray && (
        <TextField
          label="Temporary fasteners in the tray now"
          type="number"
          inputMode="numeric"
          min={0}
          max={tool.trayCapacity ?? undefined}
          value={count}
          onChange={(e) => setCount(e.target.value)}
          hint={`A full tray holds ${tool.trayCapacity}.`}
        />
      )}
      {condition === 'needs_attention' && (
        <TextField label="What needs attention?" value={note} onChange={(e) => setNote(e.target.value)} hint="A photo can be added later, with a connection." />
      )}
      <Button onClick={() => void submit()} busy={busy} className="w-full text-lg">
        Return {tool.code}
      </Button>
    </div>
  );
}
