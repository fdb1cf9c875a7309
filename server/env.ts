import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { randomToken } from './lib/secrets';

const flag = z
  .enum(['0', '1', 'true', 'false', 'yes', 'no'])
  .transform((v) => v === '1' || v === 'true' || v === 'yes');

const envSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(5810),
  HOST: z.string().min(1).default('127.0.0.1'),
  DATABASE_URL: z.string().url().optional(),
  PUBLIC_URL: z.string().url().optional(),
  PITWALL_DATA_DIR: z.string().default('.data'),
  PITWALL_TOKEN_SECRET: z.string().min(32, 'PITWALL_TOKEN_SECRET needs at least 32 characters').optional(),
  PITWALL_SIMULATOR: flag.default(true),
  PITWALL_COOKIE_SECURE: flag.default(false),
  SMTP_HOST: z.string().optional(),
  SMTP_PORT: z.coerce.number().int().positive().default(587),
  SMTP_SECURE: flag.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  SMTP_FROM: z.string().default('Pitwall <pitwall@localhost>'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
});

export type Env = z.infer<typeof envSchema>;

/** Reads and checks the environment once at boot; a bad value stops the process with its name. */
export function readEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const cleaned = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== ''));
  const parsed = envSchema.safeParse(cleaned);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  return parsed.data;
}

/** The token secret from the environment, or one generated once and kept under the data folder. */
export function loadTokenSecret(env: Env): string {
  if (env.PITWALL_TOKEN_SECRET) return env.PITWALL_TOKEN_SECRET;
  const file = path.resolve(env.PITWALL_DATA_DIR, 'token-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(path.dirname(file), { recursive: true });
  const secret = randomToken(48);
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  chmodSync(file, 0o600);
  return secret;
}
