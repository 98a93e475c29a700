/**
 * verifyPdf: checks a deliverable the client holds against its own signature.
 *
 * What is checked:
 * - there is exactly one signature (/ByteRange + /Contents), and its byte ranges start at byte 0,
 *   meet exactly at the hex slot, and end at the last byte: nothing outside them, no later update;
 * - the slot holds lowercase hex only, one DER PKCS#7 object followed by zero padding (so a changed
 *   byte anywhere, padding included, fails);
 * - SHA-256 of the signed ranges equals the signed messageDigest attribute, the digest algorithm
 *   is SHA-256, and the RSA signature over the signed attributes verifies with the signer's
 *   certificate (the one matching the signer's serial number);
 * - the signing time lies in the certificate's validity period;
 * - when `trustedCertPem` is given, the signer's certificate is exactly that certificate.
 * What is not: certificate chains to a public CA, revocation (CRL/OCSP), trusted timestamps,
 * and anything about the content beyond "these bytes are the ones signed".
 */
import { createHash } from 'node:crypto';
import forge from 'node-forge';
import { findSignature } from './find-signature';

export interface VerifyResult {
  signed: boolean;
  /**
   * The one verdict to show: the PKCS#7 signature verifies, over exactly this file's bytes, with a
   * certificate valid at signing time (and, if asked, the trusted one).
   */
  signatureValid: boolean;
  /** The signed bytes are the whole file and their digest matches the signed one. */
  integrityOk: boolean;
  signerCommonName: string | null;
  signingTime: string | null;
  /** The revision fingerprint the signed file carries (signature Reason or metadata). */
  revisionSha256: string | null;
  /** Why the file is or is not valid, in words a client can read. */
  reason: string;
}

const SHA_IN_REASON = /revision SHA-256 ([0-9a-f]{64})/;
const SHA_IN_KEYWORDS = /sojourn-revision-sha256:([0-9a-f]{64})/;

type Attr = { value: forge.asn1.Asn1[] };
interface Capture {
  certificates?: unknown;
  digestAlgorithm: string;
  authenticatedAttributes?: forge.asn1.Asn1[];
  signature: string;
  serial: string;
}

function attribute(attrs: forge.asn1.Asn1[], oid: string): forge.asn1.Asn1 | null {
  for (const a of attrs) {
    const [type, values] = (a as unknown as Attr).value;
    if (forge.asn1.derToOid(type.value as string) === oid) return (values as unknown as Attr).value[0] ?? null;
  }
  return null;
}

export function verifyPdf(pdf: Buffer, trustedCertPem?: string): VerifyResult {
  const result: VerifyResult = { signed: false, signatureValid: false, integrityOk: false, signerCommonName: null, signingTime: null, revisionSha256: null, reason: '' };
  const found = findSignature(pdf);
  if (found.kind === 'none') return { ...result, reason: 'The file carries no digital signature.' };
  result.signed = true;
  if (found.kind === 'malformed') return { ...result, reason: found.problem };
  const { der, signedBytes, signatureReason } = found;
  result.revisionSha256 = SHA_IN_REASON.exec(signatureReason ?? '')?.[1] ?? SHA_IN_KEYWORDS.exec(signedBytes.toString('latin1'))?.[1] ?? null;

  let p7: forge.pkcs7.PkcsSignedData;
  try {
    p7 = forge.pkcs7.messageFromAsn1(forge.asn1.fromDer(forge.util.createBuffer(der.toString('binary')))) as forge.pkcs7.PkcsSignedData;
  } catch {
    return { ...result, reason: 'The signature is not a readable PKCS#7 object.' };
  }
  const cap = (p7 as unknown as { rawCapture: Capture }).rawCapture;
  const cert = p7.certificates.find((c) => c.serialNumber === forge.util.bytesToHex(cap.serial)) ?? null;
  if (!cert || !cap.authenticatedAttributes) return { ...result, reason: 'The signature names no certificate or signed attributes.' };
  result.signerCommonName = ((cert.subject.getField('CN') as { value?: string } | null)?.value ?? null) || null;
  const time = attribute(cap.authenticatedAttributes, forge.pki.oids.signingTime);
  const when = time ? forge.asn1.utcTimeToDate(time.value as string) : null;
  result.signingTime = when ? when.toISOString() : null;

  const digest = attribute(cap.authenticatedAttributes, forge.pki.oids.messageDigest);
  const actual = createHash('sha256').update(signedBytes).digest('binary');
  const sha256 = forge.asn1.derToOid(cap.digestAlgorithm) === forge.pki.oids.sha256;
  result.integrityOk = sha256 && digest !== null && digest.value === actual;

  // The signature is over the DER of the signed attributes as a SET (RFC 5652 §5.4).
  const set = forge.asn1.create(forge.asn1.Class.UNIVERSAL, forge.asn1.Type.SET, true, cap.authenticatedAttributes);
  const md = forge.md.sha256.create().update(forge.asn1.toDer(set).getBytes());
  let cryptoOk: boolean;
  try {
    cryptoOk = (cert.publicKey as forge.pki.rsa.PublicKey).verify(md.digest().bytes(), cap.signature);
  } catch {
    cryptoOk = false; // a malformed signature value throws instead of returning false
  }
  const inValidity = when !== null && when >= cert.validity.notBefore && when <= cert.validity.notAfter;
  const trusted = !trustedCertPem || forge.asn1.toDer(forge.pki.certificateToAsn1(cert)).getBytes() === forge.asn1.toDer(forge.pki.certificateToAsn1(forge.pki.certificateFromPem(trustedCertPem))).getBytes();
  result.signatureValid = cryptoOk && result.integrityOk && inValidity && trusted;

  if (!result.integrityOk) result.reason = 'The file was changed after it was signed: its content does not match the signed digest.';
  else if (!cryptoOk) result.reason = 'The signature does not verify with the certificate it names.';
  else if (!inValidity) result.reason = 'The signing time lies outside the certificate’s validity period.';
  else if (!trusted) result.reason = 'The file was signed by a certificate other than the firm’s.';
  else result.reason = `Signed by ${result.signerCommonName ?? 'an unnamed signer'}; the file is unchanged since signing.`;
  return result;
}
