import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import type { z } from 'zod';
import { loginBodySchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useLogin } from '../api/login';

type Input = z.input<typeof loginBodySchema>;
type Field = keyof Input;
type Errors = Partial<Record<Field, string>>;
const FIELDS: readonly Field[] = ['email', 'password'];

/** The first message the shared schema gives for each field; none when the body is valid. */
function fieldErrors(values: Input): Errors {
  const result = loginBodySchema.safeParse(values);
  const errors: Errors = {};
  for (const issue of result.error?.issues ?? []) {
    const field = issue.path[0] as Field;
    errors[field] ??= issue.message;
  }
  return errors;
}

/**
 * Two fields checked by the same schema as the server, written without a form library: the sign-in
 * page is the first load on a phone, and this form is all it has (every other form loads with its page).
 */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const login = useLogin();
  const [values, setValues] = useState<Input>({ email: '', password: '' });
  const [errors, setErrors] = useState<Errors>({});
  const [tried, setTried] = useState(false);
  const [problem, setProblem] = useState<string>();
  const [showPassword, setShowPassword] = useState(false);

  const change = (field: Field) => (e: { target: { value: string } }) => {
    const next = { ...values, [field]: e.target.value };
    setValues(next);
    if (tried) setErrors(fieldErrors(next));
  };

  const submit = async (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    setTried(true);
    setProblem(undefined);
    const found = fieldErrors(values);
    setErrors(found);
    const first = FIELDS.find((f) => found[f]);
    if (first) {
      (e.currentTarget.elements.namedItem(first) as HTMLInputElement | null)?.focus();
      return;
    }
    try {
      await login.mutateAsync(loginBodySchema.parse(values));
      onSignedIn();
    } catch (err) {
      const fromServer: Errors = {};
      setProblem(applyServerErrors<Input>(err, (name, { message }) => (fromServer[name as Field] = message), FIELDS));
      setErrors(fromServer);
    }
  };

  return (
    <form onSubmit={(e) => void submit(e)} noValidate className="flex flex-col gap-4">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <TextField label="E-mail" name="email" type="email" autoComplete="username" inputMode="email" value={values.email} onChange={change('email')} error={errors.email} />
      <TextField
        label="Password"
        name="password"
        type={showPassword ? 'text' : 'password'}
        autoComplete="current-password"
        value={values.password}
        onChange={change('password')}
        error={errors.password}
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
