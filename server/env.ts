import { z } from 'zod';

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  DATABASE_PATH: z.string().min(1).default('data/gripline.db'),
  /** Where backups go; unset: backups/ beside the database (server/backup/take-backup.ts). */
  BACKUP_DIR: z.string().min(1).optional(),
  SESSION_SECRET: z.string().min(32, { error: 'SESSION_SECRET must be at least 32 characters.' }).optional(),
  SESSION_IDLE_MINUTES: z.coerce.number().int().positive().default(480),
  SECURE_COOKIES: z.stringbool().default(false),
  PUBLIC_URL: z.url().optional(),
  SMTP_URL: z.url().optional(),
  MAIL_FROM: z.string().default('Gripline <gripline@example.org>'),
  TRUST_PROXY_HOPS: z.coerce.number().int().min(0).default(0),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SEED_DEMO: z.stringbool().default(true),
  TLS_CERT_FILE: z.string().min(1).optional(),
  TLS_KEY_FILE: z.string().min(1).optional(),
  /** The payment provider's secret API key; unset: the local fake provider is started instead. */
  PAYMENTS_SECRET_KEY: z.string().min(1).optional(),
  /** The secret the provider signs webhooks with; required with a real key. */
  PAYMENTS_WEBHOOK_SECRET: z.string().min(1).optional(),
}).superRefine((env, ctx) => {
  if (env.PAYMENTS_SECRET_KEY !== undefined && env.PAYMENTS_WEBHOOK_SECRET === undefined) {
    ctx.addIssue({ code: 'custom', path: ['PAYMENTS_WEBHOOK_SECRET'], message: 'not set; a real PAYMENTS_SECRET_KEY needs the webhook signing secret of the endpoint /api/payments/webhook.' });
  }
  if ((env.TLS_CERT_FILE === undefined) === (env.TLS_KEY_FILE === undefined)) return;
  const missing = env.TLS_CERT_FILE === undefined ? 'TLS_CERT_FILE' : 'TLS_KEY_FILE';
  ctx.addIssue({
    code: 'custom',
    path: [missing],
    message: 'not set; HTTPS needs both TLS_CERT_FILE and TLS_KEY_FILE (PEM certificate and key paths): set both, or neither.',
  });
});

export type Env = z.infer<typeof envSchema>;

/** Reads the environment once; a bad value stops the start with a message that names it. */
export function readEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Gripline cannot start; fix these settings:\n${lines.join('\n')}`);
  }
  return result.data;
}
