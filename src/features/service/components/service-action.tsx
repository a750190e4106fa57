import { useState } from 'react';
import type { ServiceDueItem } from '@shared/schemas/overdue';
import { Button } from '@/components/ui/button';
import type { ServiceCommand } from '../api/service-commands';
import { ServiceNoteForm } from './service-note-form';

const ACTIONS: Partial<Record<ServiceDueItem['status'], { command: ServiceCommand; label: string }>> = {
  out_of_service: { command: 'back-in-service-serviced', label: 'Back in service (serviced)' },
  available: { command: 'out-of-service', label: 'Take out for service' },
  held: { command: 'out-of-service', label: 'Take out for service' },
};

/** The next step for a tool on the service list; a tool on loan must come back first. */
export function ServiceAction({ item }: { item: ServiceDueItem }) {
  const [open, setOpen] = useState(false);
  const action = ACTIONS[item.status];
  if (!action) return <p className="text-sm text-steel">On loan: ask for it back before servicing.</p>;
  if (open) return <ServiceNoteForm code={item.code} command={action.command} submitLabel={action.label} onDone={() => setOpen(false)} />;
  return (
    <Button variant="secondary" onClick={() => setOpen(true)}>
      {action.label}
    </Button>
  );
}
