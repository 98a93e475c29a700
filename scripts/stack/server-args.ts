/**
 * How every script starts the API server's node. A 16 MB young generation (V8's default is
 * smaller) halves the time spent collecting the short-lived objects of each request; measured
 * with `npm run bench -- api`. `npm run serve` in package.json uses the same flags.
 */
export const SERVER_NODE_ARGS = ['--max-semi-space-size=16', '--import', 'tsx'];
