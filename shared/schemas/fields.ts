import { z } from 'zod';
import { ROLES } from '../roles';

export const emailField = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.org.' }));

/** OWASP asks for at least 8 characters; 10 costs a hangar little and buys a lot. */
export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 200;

export const newPasswordField = z
  .string({ error: 'Enter a password.' })
  .min(PASSWORD_MIN, { error: `Use at least ${PASSWORD_MIN} characters.` })
  .max(PASSWORD_MAX, { error: `Use at most ${PASSWORD_MAX} characters.` });

export const personNameField = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, { error: 'Enter a name.' })
  .max(80, { error: 'Keep the name under 80 characters.' });

export const roleField = z.enum(ROLES, { error: 'Choose member, quartermaster or lead.' });

/** Tokens in e-mailed links: 32 random bytes, base64url. */
export const linkTokenField = z
  .string({ error: 'The link is missing its code.' })
  .regex(/^[A-Za-z0-9_-]{43}$/, { error: 'This link is not complete; open it again from the e-mail.' });

export const idParam = z.coerce
  .number({ error: 'The id must be a number.' })
  .int({ error: 'The id must be a whole number.' })
  .positive({ error: 'The id must be a positive number.' });

/** The body of a command that takes no fields: `{}` or none at all; a field sent anyway is refused by name. */
export const noFieldsBodySchema = z.strictObject({});

/** A body that changes part of a record: any of these fields, at least one, and none it does not know. */
export const changeBody = <S extends z.ZodRawShape>(fields: S) =>
  z
    .object(fields)
    .partial()
    .strict()
    .refine((b) => Object.keys(b).length > 0, { error: 'Send at least one field to change.' });

/** An amount typed in dollars and cents ("12.50", "$12.50", "1,200"), read as whole cents. */
export const dollarsAndCentsField = (missing: string) =>
  z
    .string({ error: missing })
    .trim()
    .transform((s) => s.replace(/^\$/, '').replace(/,/g, ''))
    .refine((s) => s !== '', { error: missing })
    .refine((s) => s === '' || /^\d+(\.\d{1,2})?$/.test(s), { error: 'Enter dollars and cents, like 12.50.' })
    .transform((s) => Math.round(Number(s) * 100));
