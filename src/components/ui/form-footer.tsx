import type { ReactNode } from 'react';
import { Button, type ButtonProps } from './button';

export interface FormFooterProps {
  /** The submit button's words. */
  submit: ReactNode;
  /** While the form is saving: the button spins and takes no second press. */
  busy: boolean;
  /** A form that cannot be sent yet (nothing picked, nothing changed). */
  disabled?: boolean;
  variant?: ButtonProps['variant'];
  /** With it, a Cancel button beside the submit button. */
  onCancel?: () => void;
  cancelVariant?: ButtonProps['variant'];
}

/** The end of a form: its submit button with the pending state, and Cancel where the form can be closed. */
export function FormFooter({ submit, busy, disabled, variant = 'primary', onCancel, cancelVariant = 'quiet' }: FormFooterProps) {
  return (
    <div className="flex flex-wrap gap-2">
      <Button type="submit" variant={variant} busy={busy} disabled={disabled}>
        {submit}
      </Button>
      {onCancel && (
        <Button variant={cancelVariant} onClick={onCancel}>
          Cancel
        </Button>
      )}
    </div>
  );
}
