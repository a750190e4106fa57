import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { resetRequestBodySchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useRequestPasswordReset } from '../api/password-reset';

type Input = z.input<typeof resetRequestBodySchema>;
type Output = z.output<typeof resetRequestBodySchema>;

export function ResetRequestForm() {
  const request = useRequestPasswordReset();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(resetRequestBodySchema), defaultValues: { email: '' } });

  if (request.isSuccess) return <Notice tone="ok" title="Check your e-mail">{request.data.message}</Notice>;

  return (
    <form onSubmit={form.handleSubmit((body) => request.mutate(body))} noValidate className="flex flex-col gap-4">
      {request.isError && <Notice tone="bad">{messageOf(request.error)}</Notice>}
      <TextField
        label="E-mail of your account"
        type="email"
        autoComplete="username"
        inputMode="email"
        error={form.formState.errors.email?.message}
        {...form.register('email')}
      />
      <Button type="submit" busy={request.isPending}>
        Send me a reset link
      </Button>
    </form>
  );
}
