import { useState } from 'react';
import { toast } from 'sonner';
import type { Tool } from '@shared/schemas/tools';
import { STATUS_LABELS } from '@shared/tools/categories';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { useStatusCommand, type StatusCommandPath } from '../api/tool-actions';

const COMMANDS: { path: StatusCommandPath; label: string; from: Tool['status'][]; serviced?: boolean }[] = [
  { path: 'back-in-service', label: 'Back in service after servicing', from: ['out_of_service'], serviced: true },
  { path: 'back-in-service', label: 'Back in service', from: ['out_of_service'] },
  { path: 'out-of-service', label: 'Take out of service', from: ['available', 'held'] },
  { path: 'lost', label: 'Mark lost', from: ['available', 'on_loan', 'held', 'out_of_service'] },
  { path: 'found', label: 'Found it', from: ['lost'] },
  { path: 'retire', label: 'Retire', from: ['available', 'out_of_service', 'lost'] },
];

/** State changes only the quartermaster and lead make, each with a reason for the audit trail. */
export function QuartermasterCommands({ tool }: { tool: Tool }) {
  const command = useStatusCommand();
  const [chosen, setChosen] = useState<(typeof COMMANDS)[number]>();
  const [note, setNote] = useState('');
  const available = COMMANDS.filter((c) => c.from.includes(tool.status));
  if (available.length === 0) return null;

  const run = () => {
    if (!chosen) return;
    command.mutate(
      { code: tool.code, command: chosen.path, note, serviced: chosen.serviced },
      {
        onSuccess: (r) => {
          toast.success(`${tool.code}: ${STATUS_LABELS[r.status as Tool['status']] ?? r.status}.`);
          setChosen(undefined);
          setNote('');
        },
        onError: (err) => toast.error(messageOf(err)),
      },
    );
  };

  return (
    <Card title="Quartermaster">
      {chosen ? (
        <div className="flex flex-col gap-3">
          <TextField label={`Reason: ${chosen.label.toLowerCase()}`} value={note} onChange={(e) => setNote(e.target.value)} autoFocus />
          <div className="flex flex-wrap gap-2">
            <Button onClick={run} busy={command.isPending} disabled={!note.trim()}>
              {chosen.label}
            </Button>
            <Button variant="quiet" onClick={() => setChosen(undefined)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2">
          {available.map((c) => (
            <Button key={c.label} variant="secondary" onClick={() => setChosen(c)}>
              {c.label}
            </Button>
          ))}
        </div>
      )}
    </Card>
  );
}
