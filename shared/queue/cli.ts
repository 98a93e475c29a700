/**
 * `npm run -s queue -- [file.json]`: reads one spec or an array of specs (from the file or from
 * standard input) and prints the results as JSON in the same order; an invalid spec gives
 * { "error": {…} } in its place. Exit code 2 if any spec failed, 1 if the input is not JSON.
 */
import { readFileSync } from 'node:fs';
import { compute, ENGINE_VERSION, QueueError } from './index';

function run(spec: unknown): { ok: boolean; out: unknown } {
  try {
    return { ok: true, out: compute(spec) };
  } catch (err) {
    if (err instanceof QueueError) return { ok: false, out: { error: err.toJSON() } };
    throw err;
  }
}

const file = process.argv[2];
let text: string;
let input: unknown;
try {
  text = readFileSync(file && file !== '-' ? file : 0, 'utf8');
  input = JSON.parse(text);
} catch (err) {
  process.stderr.write(`queue ${ENGINE_VERSION}: cannot read a JSON spec: ${(err as Error).message}\n`);
  process.exit(1);
}
const results = Array.isArray(input) ? input.map(run) : [run(input)];
const out = Array.isArray(input) ? results.map((r) => r.out) : results[0].out;
process.stdout.write(`${JSON.stringify(out, null, 2)}\n`);
process.exitCode = results.every((r) => r.ok) ? 0 : 2;
