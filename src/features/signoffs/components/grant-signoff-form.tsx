import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { grantSignoffBodySchema, type Signoff } from '@shared/schemas/signoffs';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useGrantSignoff } from '../api/grant-signoff';

type Input = z.input<typeof grantSignoffBodySchema>;
type Output = z.output<typeof grantSignoffBodySchema>;
export interface Candidate {
  id: number;
  name: string;
}

/** Signs one of `candidates` (active people who do not hold it yet) off for the sign-off. */
export function GrantSignoffForm({ signoff, candidates }: { signoff: Signoff; candidates: Candidate[] }) {
  const grant = useGrantSignoff();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(grantSignoffBodySchema) });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async ({ userId }) => {
    try {
      const done = await grant.mutateAsync({ signoffId: signoff.id, userId });
      toast.success(`${done.holder.name} is signed off for ${signoff.name}.`);
      form.reset();
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['userId']) });
    }
  });

  if (candidates.length === 0) return <p className="text-steel">Everyone active in the chapter holds this sign-off.</p>;
  const options = [{ value: '', label: 'Choose a person' }, ...candidates.map((c) => ({ value: String(c.id), label: c.name }))];

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label={`Sign someone off for ${signoff.name}`}>
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="sm:flex-1">
          <SelectField
            label="Person to sign off"
            options={options}
            defaultValue=""
            error={errors.userId?.message}
            {...form.register('userId', { setValueAs: (v: string) => (v === '' ? undefined : Number(v)) })}
          />
        </div>
        <Button type="submit" variant="secondary" busy={grant.isPending}>
          Sign off
        </Button>
      </div>
    </form>
  );
}
