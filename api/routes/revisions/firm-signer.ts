import { readFileSync } from 'node:fs';
import type { Config } from '../../config';
import { ensureFirmCertificate, openP12, type FirmCertificate } from '../../signing/firm-certificate';

const cache = new WeakMap<Config['signing'], Promise<FirmCertificate>>();

/**
 * The firm's certificate as configured (production PKCS#12, else the demo one in the private
 * data folder), read once per configuration. A failed read is not cached, so fixing the
 * configuration file and retrying a release works without a restart.
 */
export function firmCertificate(cfg: Config['signing']): Promise<FirmCertificate> {
  let p = cache.get(cfg);
  if (!p) {
    p = (async () => {
      const p12 = cfg.p12Base64 ? Buffer.from(cfg.p12Base64, 'base64') : cfg.p12Path ? readFileSync(cfg.p12Path) : null;
      if (p12) return openP12(p12, cfg.passphrase);
      if (!cfg.demoDir) throw new Error('No signing certificate is configured (SIGNING_P12_PATH or SIGNING_P12_BASE64 with SIGNING_P12_PASSPHRASE).');
      return ensureFirmCertificate(cfg.demoDir);
    })();
    p.catch(() => cache.delete(cfg));
    cache.set(cfg, p);
  }
  return p;
}
