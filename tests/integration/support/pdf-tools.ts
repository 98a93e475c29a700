/** poppler-utils (installed by scripts/test.mjs) run on a PDF buffer. */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

function onFile<T>(pdf: Buffer, run: (file: string) => T): T {
  const dir = mkdtempSync(join(tmpdir(), 'sojourn-pdf-'));
  try {
    const file = join(dir, 'file.pdf');
    writeFileSync(file, pdf);
    return run(file);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export const pdfText = (pdf: Buffer): string => onFile(pdf, (f) => spawnSync('pdftotext', ['-layout', f, '-'], { encoding: 'utf8' }).stdout);

/** pdfsig's report (stdout and stderr together: it prints problems on either). */
export const pdfsig = (pdf: Buffer): string =>
  onFile(pdf, (f) => {
    const r = spawnSync('pdfsig', [f], { encoding: 'utf8' });
    return `${r.stdout}${r.stderr}`;
  });

/** Downloads a presigned link: status and bytes. */
export async function download(url: string): Promise<{ status: number; body: Buffer }> {
  const res = await fetch(url);
  return { status: res.status, body: Buffer.from(await res.arrayBuffer()) };
}
