import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createSignoffBodySchema, type Signoff } from '@shared/schemas/signoffs';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useSaveSignoff } from '../api/save-signoff';

type Input = z.input<typeof createSignoffBodySchema>;
type Output = z.output<typeof createSignoffBodySchema>;

/** Defines a sign-off, or renames and describes `signoff` when given. */
export function SignoffForm({ signoff, onDone }: { signoff?: Signoff; onDone?: () => void }) {
  const save = useSaveSignoff();
  const form = useForm<Input, unknown, Output>({
    resolver: zodResolver(createSignoffBodySchema),
    defaultValues: { name: signoff?.name ?? '', description: signoff?.description ?? '' },
  });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (body) => {
    try {
      const saved = await save.mutateAsync({ id: signoff?.id, body });
      toast.success(signoff ? `Saved "${saved.name}".` : `"${saved.name}" is defined. Sign people off for it below.`);
      if (!signoff) form.reset({ name: '', description: '' });
      onDone?.();
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['name', 'description']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label={signoff ? `Edit ${signoff.name}` : 'Define a sign-off'}>
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <TextField label="Name" hint="What it covers, like Air tools or Drill press." autoComplete="off" error={errors.name?.message} {...form.register('name')} />
      <TextField
        label="Description (optional)"
        hint="What the member shows before being signed off."
        autoComplete="off"
        error={errors.description?.message}
        {...form.register('description')}
      />
      <FormFooter submit={signoff ? 'Save changes' : 'Define sign-off'} busy={save.isPending} onCancel={signoff ? onDone : undefined} />
    </form>
  );
}
