// `npm test`: install what is missing, then typecheck, lint and run every test on a throwaway stack.
import { ensureDependencies, runTs } from './bootstrap.mjs';

ensureDependencies();
runTs('scripts/stack/test-stack.ts', process.argv.slice(2));
