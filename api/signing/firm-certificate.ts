/**
 * The firm's signing certificate.
 *
 * Production supplies its own PKCS#12 (issued by a CA the firm's clients trust) through the
 * environment: SIGNING_P12_BASE64 or SIGNING_P12_PATH, with SIGNING_P12_PASSPHRASE. Without
 * them (demo, development, tests) a self-signed "Sojourn demo firm" certificate is made once in
 * the private data folder and reused: the .p12 and a random passphrase beside it, both mode 600.
 */
import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, linkSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import forge from 'node-forge';

export interface FirmCertificate {
  /** PKCS#12 bytes (private key and certificate). */
  p12: Buffer;
  passphrase: string;
  /** The signing certificate, PEM, e.g. to pass to verifyPdf as the trusted one. */
  certificatePem: string;
  commonName: string;
}

export const DEMO_COMMON_NAME = 'Sojourn demo firm';
const P12_FILE = 'firm-signing.p12';
const PASS_FILE = 'firm-signing.passphrase';

/** Reads a PKCS#12 and finds the certificate that matches its private key. */
export function openP12(p12: Buffer, passphrase: string): FirmCertificate {
  const parsed = forge.pkcs12.pkcs12FromAsn1(forge.asn1.fromDer(forge.util.createBuffer(p12.toString('binary'))), passphrase);
  const certs = (parsed.getBags({ bagType: forge.pki.oids.certBag })[forge.pki.oids.certBag] ?? []).map((b) => b.cert).filter((c): c is forge.pki.Certificate => !!c);
  const key = parsed.getBags({ bagType: forge.pki.oids.pkcs8ShroudedKeyBag })[forge.pki.oids.pkcs8ShroudedKeyBag]?.[0]?.key as forge.pki.rsa.PrivateKey | undefined;
  if (!key) throw new Error('The signing PKCS#12 holds no private key.');
  const cert = certs.find((c) => (c.publicKey as forge.pki.rsa.PublicKey).n.equals(key.n));
  if (!cert) throw new Error('The signing PKCS#12 holds no certificate for its private key.');
  const cn = cert.subject.getField('CN') as { value?: string } | null;
  return { p12, passphrase, certificatePem: forge.pki.certificateToPem(cert), commonName: cn?.value ?? '' };
}

function makeDemoP12(passphrase: string): Buffer {
  // forge uses node's native RSA key generation when it is available (milliseconds, not seconds).
  const keys = forge.pki.rsa.generateKeyPair({ bits: 2048, e: 0x10001 });
  const cert = forge.pki.createCertificate();
  cert.publicKey = keys.publicKey;
  cert.serialNumber = `01${randomBytes(15).toString('hex')}`; // positive, 128 bits of randomness
  const now = new Date();
  cert.validity.notBefore = new Date(now.getTime() - 60_000);
  cert.validity.notAfter = new Date(now);
  cert.validity.notAfter.setFullYear(now.getFullYear() + 5);
  const name = [{ name: 'commonName', value: DEMO_COMMON_NAME }, { name: 'organizationName', value: 'Sojourn (demonstration only)' }];
  cert.setSubject(name);
  cert.setIssuer(name);
  cert.setExtensions([
    { name: 'basicConstraints', cA: false },
    { name: 'keyUsage', digitalSignature: true, nonRepudiation: true },
    { name: 'subjectKeyIdentifier' },
  ]);
  cert.sign(keys.privateKey, forge.md.sha256.create());
  const asn1 = forge.pkcs12.toPkcs12Asn1(keys.privateKey, [cert], passphrase, { algorithm: '3des', friendlyName: DEMO_COMMON_NAME });
  return Buffer.from(forge.asn1.toDer(asn1).getBytes(), 'binary');
}

/**
 * The demo certificate in `dir`, made on first use. Safe when several processes start at once:
 * each builds its files in a private temporary folder and the first to hard-link its passphrase
 * into place wins; the others wait for the winner's .p12 and use it.
 */
export async function ensureFirmCertificate(dir: string): Promise<FirmCertificate> {
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  const p12Path = join(dir, P12_FILE);
  const passPath = join(dir, PASS_FILE);
  if (!existsSync(passPath)) {
    const tmp = join(dir, `.cert-${process.pid}-${randomBytes(6).toString('hex')}`);
    mkdirSync(tmp, { mode: 0o700 });
    try {
      const passphrase = randomBytes(24).toString('base64url');
      writeFileSync(join(tmp, PASS_FILE), passphrase, { mode: 0o600 });
      writeFileSync(join(tmp, P12_FILE), makeDemoP12(passphrase), { mode: 0o600 });
      try {
        linkSync(join(tmp, PASS_FILE), passPath); // atomic, fails if another process won
        renameSync(join(tmp, P12_FILE), p12Path);
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
      }
    } finally {
      rmSync(tmp, { recursive: true, force: true });
    }
  }
  for (let waited = 0; !existsSync(p12Path); waited += 50) {
    if (waited > 10_000) throw new Error(`The demo signing certificate in ${dir} is incomplete (passphrase without .p12).`);
    await new Promise((r) => setTimeout(r, 50));
  }
  chmodSync(p12Path, 0o600);
  chmodSync(passPath, 0o600);
  return openP12(readFileSync(p12Path), readFileSync(passPath, 'utf8').trim());
}

export interface SigningConfig {
  env?: NodeJS.ProcessEnv;
  /** Private data folder for the demo certificate (used only without production settings). */
  demoDir: string;
}

/** Production certificate from the environment, else the demo one in `demoDir`. */
export async function loadFirmCertificate(config: SigningConfig): Promise<FirmCertificate> {
  const env = config.env ?? process.env;
  const fromEnv = env.SIGNING_P12_BASE64 ? Buffer.from(env.SIGNING_P12_BASE64, 'base64') : env.SIGNING_P12_PATH ? readFileSync(env.SIGNING_P12_PATH) : null;
  if (!fromEnv) return ensureFirmCertificate(config.demoDir);
  if (env.SIGNING_P12_PASSPHRASE === undefined) throw new Error('SIGNING_P12_PASSPHRASE must be set with SIGNING_P12_BASE64 or SIGNING_P12_PATH.');
  return openP12(fromEnv, env.SIGNING_P12_PASSPHRASE);
}
