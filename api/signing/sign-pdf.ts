/**
 * Signs a rendered PDF with the firm's certificate: a PKCS#7 detached signature (SHA-256, RSA)
 * over the whole file except the signature's own hex slot, in a plain incremental signature
 * dictionary. The revision's SHA-256 goes into the signature's Reason so a verifier can tell
 * which revision the file claims to be, and the signature covers that claim.
 */
import { plainAddPlaceholder } from '@signpdf/placeholder-plain';
import { P12Signer } from '@signpdf/signer-p12';
import { SignPdf } from '@signpdf/signpdf';
import type { FirmCertificate } from './firm-certificate';

/** Room for the DER signature (hex doubles it): a 2048-bit key and one certificate need ~3 kB. */
const SIGNATURE_LENGTH = 8192;

export interface SignatureDetails {
  reason: string;
  /** Signer's name as shown by PDF readers (e.g. the firm's name). */
  name: string;
  location: string;
}

/** The Reason text that carries a revision's fingerprint; verifyPdf reads it back. */
export function releaseReason(revisionNumber: number, sha256: string): string {
  return `Release of revision ${revisionNumber}; revision SHA-256 ${sha256}`;
}

export async function signPdf(pdf: Buffer, cert: FirmCertificate, details: SignatureDetails): Promise<Buffer> {
  const withPlaceholder = plainAddPlaceholder({ pdfBuffer: pdf, reason: details.reason, name: details.name, location: details.location, contactInfo: '', signatureLength: SIGNATURE_LENGTH });
  // The class's sign(), not the default export's (which fails at run time with this version).
  return new SignPdf().sign(withPlaceholder, new P12Signer(cert.p12, { passphrase: cert.passphrase }));
}
