/**
 * pdftotext in content-stream order (-raw): the lines of one table cell come out one after the
 * other, where -layout would interleave them with the cells beside it. White space is squeezed
 * out by the callers, so a wrapped phrase is still found whole.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export function pdfRawText(pdf: Buffer): string {
  const dir = mkdtempSync(join(tmpdir(), 'sojourn-pdf-raw-'));
  try {
    const file = join(dir, 'file.pdf');
    writeFileSync(file, pdf);
    return spawnSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).stdout;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
