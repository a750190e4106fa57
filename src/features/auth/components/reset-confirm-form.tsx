import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { newPasswordField } from '@shared/schemas/fields';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useConfirmPasswordReset } from '../api/password-reset';
import { NewPasswordField } from './new-password-field';

const formSchema = z.object({ password: newPasswordField });
type Values = z.infer<typeof formSchema>;

export function ResetConfirmForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const form = useForm<Values>({ resolver: zodResolver(formSchema), defaultValues: { password: '' } });

  if (confirm.isSuccess) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="ok" title="Password changed">{confirm.data.message}</Notice>
        <LinkButton to="/sign-in">
          Go to sign in
        </LinkButton>
      </div>
    );
  }

  return (
    <form onSubmit={form.handleSubmit(({ password }) => confirm.mutate({ token, password }))} noValidate className="flex flex-col gap-4">
      {confirm.isError && <Notice tone="bad">{messageOf(confirm.error)}</Notice>}
      <NewPasswordField error={form.formState.errors.password?.message} {...form.register('password')} />
      <Button type="submit" busy={confirm.isPending}>
        Save new password
      </Button>
    </form>
  );
}
