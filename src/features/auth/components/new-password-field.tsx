import { useState, type InputHTMLAttributes } from 'react';
import { PASSWORD_MIN } from '@shared/schemas/fields';
import { TextField } from '@/components/ui/field';

type Props = InputHTMLAttributes<HTMLInputElement> & { error?: string; label?: string };

/** A new password with a show toggle: typing blind on a phone at the bench is error-prone. */
export function NewPasswordField({ error, label = 'New password', ...input }: Props) {
  const [show, setShow] = useState(false);
  return (
    <div className="flex flex-col gap-2">
      <TextField
        label={label}
        type={show ? 'text' : 'password'}
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters. A few words strung together work well.`}
        error={error}
        {...input}
      />
      <label className="flex min-h-12 items-center gap-3 text-sm">
        <input type="checkbox" className="size-5 accent-ink" checked={show} onChange={(e) => setShow(e.target.checked)} />
        Show password
      </label>
    </div>
  );
}
