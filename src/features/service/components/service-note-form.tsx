import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { statusChangeBodySchema } from '@shared/schemas/tools';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useServiceCommand, type ServiceCommand } from '../api/service-commands';

type Input = z.input<typeof statusChangeBodySchema>;
type Output = z.output<typeof statusChangeBodySchema>;

const WORDS: Record<ServiceCommand, { label: string; hint: string; done: string }> = {
  'back-in-service-serviced': {
    label: 'What was done',
    hint: 'For example: calibrated, certificate filed in the crib binder. The service interval starts again today.',
    done: 'is back in service, serviced today',
  },
  'out-of-service': {
    label: 'Why it goes out of service',
    hint: 'For example: sent for calibration. Nobody can check it out until it is back.',
    done: 'is out of service',
  },
};

/** Asks for the note the audit trail keeps, then runs the command. */
export function ServiceNoteForm({ code, command, submitLabel, onDone }: { code: string; command: ServiceCommand; submitLabel: string; onDone: () => void }) {
  const run = useServiceCommand();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(statusChangeBodySchema), defaultValues: { note: '' } });
  const { errors } = form.formState;
  const words = WORDS[command];

  const submit = form.handleSubmit(async ({ note }) => {
    try {
      await run.mutateAsync({ code, command, note });
      toast.success(`${code} ${words.done}.`);
      onDone();
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['note']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex w-full min-w-56 flex-col gap-3">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <TextField label={words.label} hint={words.hint} error={errors.note?.message} autoFocus {...form.register('note')} />
      <FormFooter submit={submitLabel} busy={run.isPending} onCancel={onDone} />
    </form>
  );
}
