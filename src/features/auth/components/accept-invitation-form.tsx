import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ROLE_LABELS } from '@shared/roles';
import type { InvitationPreview } from '@shared/schemas/auth';
import { newPasswordField, personNameField } from '@shared/schemas/fields';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Code } from '@/components/ui/page';
import { applyServerErrors } from '@/lib/errors';
import { useAcceptInvitation } from '../api/invitation';
import { NewPasswordField } from './new-password-field';

const formSchema = z.object({ name: personNameField, password: newPasswordField });
type Input = z.input<typeof formSchema>;
type Output = z.output<typeof formSchema>;

export function AcceptInvitationForm({ token, invitation, onAccepted }: { token: string; invitation: InvitationPreview; onAccepted: () => void }) {
  const accept = useAcceptInvitation();
  const [problem, setProblem] = useState<string>();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(formSchema), defaultValues: { name: '', password: '' } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (values) => {
    setProblem(undefined);
    try {
      await accept.mutateAsync({ token, ...values });
      onAccepted();
    } catch (err) {
      setProblem(applyServerErrors(err, form.setError, ['name', 'password']));
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <p>
        {invitation.invitedBy} invited <Code>{invitation.email}</Code> to join as{' '}
        <strong>{ROLE_LABELS[invitation.role].toLowerCase()}</strong>.
      </p>
      {problem && <Notice tone="bad">{problem}</Notice>}
      <TextField label="Your name, as the chapter knows you" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
      <NewPasswordField label="Choose a password" error={errors.password?.message} {...form.register('password')} />
      <Button type="submit" busy={accept.isPending}>
        Join and sign in
      </Button>
    </form>
  );
}
