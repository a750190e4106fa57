import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { ROLE_LABELS, ROLES } from '@shared/roles';
import { inviteBodySchema } from '@shared/schemas/people';
import { SelectField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useInvite } from '../api/invite';

type Input = z.input<typeof inviteBodySchema>;
type Output = z.output<typeof inviteBodySchema>;
const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

export function InviteForm() {
  const invite = useInvite();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(inviteBodySchema), defaultValues: { email: '', role: 'member' } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (body) => {
    try {
      const sent = await invite.mutateAsync(body);
      toast.success(`Invitation sent to ${sent.email}.`);
      form.reset({ email: '', role: body.role });
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['email', 'role']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr]">
        <TextField label="E-mail" type="email" inputMode="email" autoComplete="off" error={errors.email?.message} {...form.register('email')} />
        <SelectField label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...form.register('role')} />
      </div>
      <p className="text-sm text-steel">The link in the e-mail works once, for 7 days. Inviting the same address again replaces it.</p>
      <FormFooter submit="Send invitation" busy={invite.isPending} />
    </form>
  );
}
