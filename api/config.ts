import { resolve } from 'node:path';

/**
 * Every setting comes from the environment. In production nothing is started for you: point
 * DATABASE_URL, S3_*, SMTP_URL at real services. scripts/start.mjs fills these in for the demo.
 */
export interface Config {
  port: number;
  publicUrl: string;
  databaseUrl: string;
  sessionSecret: string;
  /** Send cookies only over HTTPS (on when PUBLIC_URL is https). */
  cookieSecure: boolean;
  trustProxy: boolean;
  s3: {
    endpoint?: string;
    region: string;
    bucket: string;
    accessKeyId?: string;
    secretAccessKey?: string;
    forcePathStyle: boolean;
    /** Address browsers use for presigned links when it differs from `endpoint` (S3_PUBLIC_ENDPOINT). */
    publicEndpoint?: string;
  };
  /**
   * The firm certificate that signs released PDFs. Production: SIGNING_P12_PATH or
   * SIGNING_P12_BASE64 with SIGNING_P12_PASSPHRASE. Without them (demo and tests) a self-signed
   * certificate is made on first use and kept in `demoDir` (the private data folder); in
   * production (NODE_ENV=production) `demoDir` is null and releases fail until one is configured.
   */
  signing: { p12Path: string | null; p12Base64: string | null; passphrase: string; demoDir: string | null; location: string };
  /** Lifetime of a presigned deliverable link, in seconds. */
  deliverableLinkSeconds: number;
  /**
   * How long a release attempt holds its claim without renewing it (RELEASE_LEASE_MS). A working
   * release renews it a few times per lease; a claim whose process died expires after this and
   * is marked failed (interrupted) by the sweeper, so the partner can release again.
   */
  releaseLeaseMs: number;
  smtpUrl: string;
  mailFrom: string;
  /** HTTP address of the local SMTP fake's mailbox; null in production (the mailbox page is then off). */
  mailFakeUrl: string | null;
  signInLimit: { windowMs: number; perAccount: number; perAddress: number };
  /** How long each process may reuse a session it read (ms); see api/auth/session-store.ts. */
  sessionCacheMs: number;
  /** Where the built web app lives; null when the API runs alone (tests, dev with Vite). */
  webDist: string | null;
}

export class ConfigError extends Error {}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const missing = ['DATABASE_URL', 'SESSION_SECRET', 'S3_BUCKET', 'SMTP_URL'].filter((k) => !env[k]);
  if (missing.length > 0) {
    throw new ConfigError(`Missing environment variables: ${missing.join(', ')} (see README, "Production configuration").`);
  }
  if ((env.SESSION_SECRET ?? '').length < 32) throw new ConfigError('SESSION_SECRET must be at least 32 characters.');
  const port = Number(env.PORT ?? 3000);
  const publicUrl = (env.PUBLIC_URL ?? `http://localhost:${port}`).replace(/\/$/, '');
  const int = (v: string | undefined, d: number): number => (v && Number.isFinite(Number(v)) ? Number(v) : d);
  return {
    port,
    publicUrl,
    databaseUrl: env.DATABASE_URL as string,
    sessionSecret: env.SESSION_SECRET as string,
    cookieSecure: publicUrl.startsWith('https://'),
    trustProxy: env.TRUST_PROXY === '1',
    s3: {
      endpoint: env.S3_ENDPOINT || undefined,
      region: env.S3_REGION ?? 'us-east-1',
      bucket: env.S3_BUCKET as string,
      accessKeyId: env.S3_ACCESS_KEY_ID || undefined,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY || undefined,
      forcePathStyle: env.S3_FORCE_PATH_STYLE !== '0',
      publicEndpoint: env.S3_PUBLIC_ENDPOINT || undefined,
    },
    signing: {
      p12Path: env.SIGNING_P12_PATH || null,
      p12Base64: env.SIGNING_P12_BASE64 || null,
      passphrase: env.SIGNING_P12_PASSPHRASE ?? '',
      demoDir:
        env.SIGNING_P12_PATH || env.SIGNING_P12_BASE64 || env.NODE_ENV === 'production'
          ? null
          : resolve(env.SOJOURN_DATA_DIR ?? env.TEST_DATA_DIR ?? '.data', 'signing'),
      location: env.SIGNING_LOCATION ?? 'Sojourn',
    },
    deliverableLinkSeconds: int(env.DELIVERABLE_LINK_SECONDS, 60),
    releaseLeaseMs: Math.max(int(env.RELEASE_LEASE_MS, 60_000), 500),
    smtpUrl: env.SMTP_URL as string,
    mailFrom: env.MAIL_FROM ?? 'Sojourn <no-reply@sojourn.test>',
    mailFakeUrl: env.MAIL_FAKE_URL || null,
    signInLimit: {
      windowMs: int(env.SIGN_IN_WINDOW_MS, 15 * 60_000),
      perAccount: int(env.SIGN_IN_LIMIT_PER_ACCOUNT, 5),
      perAddress: int(env.SIGN_IN_LIMIT_PER_ADDRESS, 100),
    },
    sessionCacheMs: Math.max(int(env.SESSION_CACHE_MS, 1_000), 0),
    webDist: env.WEB_DIST || null,
  };
}
