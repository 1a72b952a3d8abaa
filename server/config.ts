/**
 * Configuration from environment variables, parsed once. Development and test get safe
 * defaults; production refuses to start without the secrets it needs.
 */
import { z } from 'zod';

const DEV_SESSION_SECRET = 'casewright-development-only-session-secret';

const schema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(5180),
    DATABASE_URL: z.string().url({ message: 'DATABASE_URL must be a postgres:// URL' }),
    SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters').optional(),
    PUBLIC_URL: z.string().url().optional(),
    CLIENT_DIR: z.string().default('dist'),
    TRUST_PROXY: z.coerce.number().int().min(0).default(0),
    SMTP_HOST: z.string().default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(0),
    MAIL_FROM: z.string().default('Casewright <no-reply@casewright.invalid>'),
    DB_TIMEOUT_MS: z.coerce.number().int().min(100).default(3000),
  })
  .transform((env, ctx) => {
    if (env.NODE_ENV === 'production' && !env.SESSION_SECRET) {
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'SESSION_SECRET is required in production' });
    }
    return {
      env: env.NODE_ENV,
      isProduction: env.NODE_ENV === 'production',
      host: env.HOST,
      port: env.PORT,
      databaseUrl: env.DATABASE_URL,
      sessionSecret: env.SESSION_SECRET ?? DEV_SESSION_SECRET,
      publicUrl: env.PUBLIC_URL,
      clientDir: env.CLIENT_DIR,
      trustProxy: env.TRUST_PROXY,
      smtp: { host: env.SMTP_HOST, port: env.SMTP_PORT, from: env.MAIL_FROM },
      dbTimeoutMs: env.DB_TIMEOUT_MS,
    };
  });

export type Config = z.output<typeof schema>;

/** Parse `env` (default: `process.env`); throws with every bad variable named. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n  ');
    throw new Error(`Invalid configuration:\n  ${problems}`);
  }
  return parsed.data;
}
