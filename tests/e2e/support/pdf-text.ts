import { execFile } from 'node:child_process';
import { promisify } from 'node:util';

const run = promisify(execFile);

/**
 * The text of a PDF as poppler's pdftotext reads it, with every run of white space (line breaks
 * where a long title wraps, page breaks) folded into one space so phrases can be searched.
 */
export async function pdfText(file: string): Promise<string> {
  const { stdout } = await run('pdftotext', ['-enc', 'UTF-8', file, '-'], { maxBuffer: 32 * 1024 * 1024 });
  return stdout.replace(/\s+/g, ' ');
}
