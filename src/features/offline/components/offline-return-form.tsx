import { useState } from 'react';
import type { CatalogueTool } from '@shared/schemas/offline';
import { returnBodySchema } from '@shared/schemas/tools';
import { Button } from '@/components/ui/button';
import { ConditionField, type ReturnCondition } from '@/components/ui/condition-field';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { queueFromCopy } from '../api/queue-from-copy';
import type { StoredCatalogue } from '../db';

/** Return from the copy: ok or needs attention (with a note), and the count for a temporary fastener tray. */
export function OfflineReturnForm({ copy, tool }: { copy: StoredCatalogue; tool: CatalogueTool }) {
  const isTray = tool.category === 'temporary_fastener_tray';
  const [condition, setCondition] = useState<ReturnCondition>('ok');
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
      <ConditionField name="offline-condition" value={condition} onChange={setCondition} />
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
