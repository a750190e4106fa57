import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import type { z } from 'zod';
import { loginBodySchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useLogin } from '../api/login';

type Input = z.input<typeof loginBodySchema>;
type Output = z.output<typeof loginBodySchema>;

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const login = useLogin();
  const [problem, setProblem] = useState<string>();
  const [showPassword, setShowPassword] = useState(false);
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(loginBodySchema), defaultValues: { email: '', password: '' } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (body) => {
    setProblem(undefined);
    try {
      await login.mutateAsync(body);
      onSignedIn();
    } catch (err) {
      setProblem(applyServerErrors(err, form.setError, ['email', 'password']));
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="username" inputMode="email" error={errors.email?.message} {...form.register('email')} />
      <TextField
        label="Password"
        type={showPassword ? 'text' : 'password'}
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      <label className="flex min-h-12 items-center gap-3 text-sm">
        <input type="checkbox" className="size-5 accent-ink" checked={showPassword} onChange={(e) => setShowPassword(e.target.checked)} />
        Show password
      </label>
      <Button type="submit" busy={login.isPending}>
        Sign in
      </Button>
      <Link to="/reset-password" className="inline-flex min-h-12 items-center self-start underline underline-offset-4">
        Forgot your password?
      </Link>
    </form>
  );
}
