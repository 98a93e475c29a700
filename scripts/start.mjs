// `npm start`: install what is missing, then run the whole product on this machine.
import { ensureDependencies, runTs } from './bootstrap.mjs';

ensureDependencies();
runTs('scripts/stack/start-stack.ts', process.argv.slice(2));
