import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

export interface LocalSecrets {
  dbPassword: string;
  sessionSecret: string;
}

/** Generated once per data folder and kept there (mode 600), so restarts reuse them. */
export function localSecrets(dataDir: string): LocalSecrets {
  mkdirSync(dataDir, { recursive: true });
  const file = join(dataDir, 'secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8')) as LocalSecrets;
  const secrets = { dbPassword: randomBytes(18).toString('base64url'), sessionSecret: randomBytes(32).toString('base64url') };
  writeFileSync(file, JSON.stringify(secrets), { mode: 0o600 });
  return secrets;
}
