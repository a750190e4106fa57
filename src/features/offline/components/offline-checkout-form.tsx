import { useState } from 'react';
import type { CatalogueTool } from '@shared/schemas/offline';
import { AccessoryChecklist } from '@/components/ui/accessory-checklist';
import { loanDueAt } from '@shared/time/chapter-time';
import { Button } from '@/components/ui/button';
import { ToolCautions } from '@/components/ui/tool-cautions';
import { chapterTimeZone } from '@/lib/chapter-zone';
import { formatDueDay } from '@/lib/format';
import { queueFromCopy } from '../api/queue-from-copy';
import type { CopyInUse } from '../db';

/** Check out from the copy: the loan period's due date, and the accessories taken along, ticked so the loan records them. */
export function OfflineCheckoutForm({ copy, tool }: { copy: CopyInUse; tool: CatalogueTool }) {
  const [busy, setBusy] = useState(false);
  // The loan period counts from now, when the member takes it off the shelf, by the server's one rule.
  const [due] = useState(() => loanDueAt(new Date(), tool.loanDays, chapterTimeZone()));
  const [ticked, setTicked] = useState<string[]>([]);
  const submit = async () => {
    setBusy(true);
    try {
      await queueFromCopy(copy, 'check_out', tool.code, tool.name, tool.accessories.length > 0 ? { accessories: ticked } : {});
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="flex flex-col gap-3">
      <p>
        Bring it back by <strong>{formatDueDay(due)}</strong> ({tool.loanDays} days).
      </p>
      {tool.accessories.length > 0 && (
        <AccessoryChecklist legend="Tick what you take with it" items={tool.accessories} ticked={ticked} onChange={setTicked} />
      )}
      <ToolCautions categories={[tool.category]} />
      <Button onClick={() => void submit()} busy={busy} className="w-full text-lg">
        Check out {tool.code}
      </Button>
    </div>
  );
}
