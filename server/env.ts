import { z } from 'zod';

// The one place that reads process.env. Everything else receives a Config.
const booleanFromEnv = z
  .enum(['true', 'false', '1', '0', ''])
  .optional()
  .transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  APP_URL: z.url().optional(),
  DATABASE_URL: z.string().optional(),
  BELLWETHER_DATA_DIR: z.string().default('.data'),
  BELLWETHER_PG_PORT: z.coerce.number().int().min(1024).max(65535).default(54329),
  SESSION_SECRET: z.string().min(32).optional(),
  SESSION_IDLE_MINUTES: z.coerce.number().int().min(1).max(7 * 24 * 60).default(240),
  SMTP_URL: z.string().optional(),
  FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  MAIL_FROM: z.string().default('Bellwether <bellwether@localhost>'),
  TRUST_PROXY: booleanFromEnv,
  LOGIN_MAX_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  LOGIN_MAX_PER_ADDRESS: z.coerce.number().int().min(1).default(30),
  LOGIN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
});

export type Env = z.infer<typeof envSchema>;

export function readEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Invalid environment:\n${lines}`);
  }
  return parsed.data;
}
