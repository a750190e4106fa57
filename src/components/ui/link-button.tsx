import { Link, type LinkProps } from 'react-router';

const LOOKS = {
  primary: 'bg-ink text-card',
  secondary: 'border-2 border-ink bg-card text-ink',
} as const;

/** A link that looks like a button (48 px tall): it goes to a page, a Button does something here. */
export function LinkButton({ variant = 'primary', className = '', ...link }: LinkProps & { variant?: keyof typeof LOOKS }) {
  return <Link {...link} className={`inline-flex min-h-12 items-center justify-center rounded-lg px-5 font-semibold ${LOOKS[variant]} ${className}`} />;
}
