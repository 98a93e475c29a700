import { mkdtempSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import forge from 'node-forge';
import { beforeAll, describe, expect, it } from 'vitest';
import { SIGN_OFF, studySnapshot } from '../pdf/fixtures/study-snapshot';
import { POPPLER_MISSING, poppler } from '../pdf/fixtures/poppler';
import { renderStudyPdf } from '../pdf/render-study-pdf';
import { DEMO_COMMON_NAME, ensureFirmCertificate, loadFirmCertificate, type FirmCertificate } from './firm-certificate';
import { releaseReason, signPdf } from './sign-pdf';
import { verifyPdf } from './verify-pdf';

// Outside reference for signatures: poppler's `pdfsig` (poppler-utils), which checks the PKCS#7
// digest and signature itself.
if (POPPLER_MISSING) console.warn(`Skipping pdfsig comparisons: ${POPPLER_MISSING}`);

const flip = (pdf: Buffer, at: number): Buffer => {
  const copy = Buffer.from(pdf);
  copy[at] ^= 0x01;
  return copy;
};

let dir: string;
let cert: FirmCertificate;
let unsigned: Buffer;
let signed: Buffer;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'sojourn-signing-'));
  cert = await ensureFirmCertificate(dir);
  unsigned = await renderStudyPdf(studySnapshot(), SIGN_OFF);
  signed = await signPdf(unsigned, cert, { reason: releaseReason(3, SIGN_OFF.sha256), name: 'Sojourn demo firm', location: 'Sojourn' });
}, 60_000);

describe('ensureFirmCertificate', () => {
  it('makes a self-signed RSA 2048 certificate for five years, files readable by the owner only', () => {
    expect(cert.commonName).toBe(DEMO_COMMON_NAME);
    const c = forge.pki.certificateFromPem(cert.certificatePem);
    expect((c.publicKey as forge.pki.rsa.PublicKey).n.bitLength()).toBe(2048);
    const years = (c.validity.notAfter.getTime() - c.validity.notBefore.getTime()) / (365.25 * 86_400_000);
    expect(years).toBeGreaterThan(4.99);
    expect(years).toBeLessThan(5.01);
    for (const f of ['firm-signing.p12', 'firm-signing.passphrase']) expect(statSync(join(dir, f)).mode & 0o777).toBe(0o600);
  });

  it('reuses the certificate it made', async () => {
    expect((await ensureFirmCertificate(dir)).certificatePem).toBe(cert.certificatePem);
  });

  it('prefers production settings from the environment', async () => {
    const env = { SIGNING_P12_BASE64: cert.p12.toString('base64'), SIGNING_P12_PASSPHRASE: cert.passphrase };
    const other = mkdtempSync(join(tmpdir(), 'sojourn-signing-empty-'));
    expect((await loadFirmCertificate({ env, demoDir: other })).certificatePem).toBe(cert.certificatePem);
    await expect(loadFirmCertificate({ env: { SIGNING_P12_PATH: join(dir, 'firm-signing.p12') }, demoDir: other })).rejects.toThrow(/SIGNING_P12_PASSPHRASE/);
    const fromPath = await loadFirmCertificate({ env: { SIGNING_P12_PATH: join(dir, 'firm-signing.p12'), SIGNING_P12_PASSPHRASE: readFileSync(join(dir, 'firm-signing.passphrase'), 'utf8') }, demoDir: other });
    expect(fromPath.commonName).toBe(DEMO_COMMON_NAME);
  });
});

describe('signPdf and verifyPdf', () => {
  it('verifies its own signature and finds the revision SHA-256', () => {
    const r = verifyPdf(signed, cert.certificatePem);
    expect(r).toMatchObject({ signed: true, signatureValid: true, integrityOk: true, signerCommonName: DEMO_COMMON_NAME, revisionSha256: SIGN_OFF.sha256 });
    expect(Date.parse(r.signingTime ?? '')).toBeGreaterThan(Date.now() - 600_000);
  });

  it('reports an unsigned PDF as unsigned (the keywords alone are not trusted for validity)', () => {
    expect(verifyPdf(unsigned)).toMatchObject({ signed: false, signatureValid: false });
  });

  it.each([
    ['a byte of the page content', (pdf: Buffer) => Math.floor(pdf.length / 3)],
    ['the first byte', () => 0],
    ['the last byte', (pdf: Buffer) => pdf.length - 1],
    ['the zero padding of the signature slot', (pdf: Buffer) => pdf.indexOf('>', pdf.indexOf('/Contents <')) - 10],
    ['the signature itself', (pdf: Buffer) => pdf.toString('latin1').indexOf('/Contents <') + 200],
  ])('fails after one byte of %s changes', (_what, at) => {
    const r = verifyPdf(flip(signed, at(signed)));
    expect(r.signed).toBe(true);
    expect(r.signatureValid).toBe(false);
  });

  it('fails when bytes are appended after signing', () => {
    expect(verifyPdf(Buffer.concat([signed, Buffer.from('\n% appended\n')])).signatureValid).toBe(false);
  });

  it('fails against another trusted certificate', async () => {
    const other = await ensureFirmCertificate(mkdtempSync(join(tmpdir(), 'sojourn-signing-other-')));
    const r = verifyPdf(signed, other.certificatePem);
    expect(r).toMatchObject({ integrityOk: true, signatureValid: false });
    expect(r.reason).toMatch(/other than the firm/);
  }, 30_000);
});

describe.skipIf(POPPLER_MISSING !== null)('signPdf against poppler pdfsig', () => {
  it('pdfsig says "Signature is Valid" and names the firm', () => {
    const out = poppler('pdfsig', signed);
    expect(out).toContain('Signature is Valid');
    expect(out).toContain(`Common Name: ${DEMO_COMMON_NAME}`);
    expect(out).toContain('Total document signed');
  });

  it('pdfsig and verifyPdf both reject the file after one content byte changes', () => {
    const tampered = flip(signed, Math.floor(signed.length / 3));
    expect(poppler('pdfsig', tampered)).not.toContain('Signature is Valid');
    expect(verifyPdf(tampered)).toMatchObject({ signatureValid: false, integrityOk: false });
  });
});
