/**
 * The API as BENCH_API_PROCESSES processes sharing one port through node:cluster, the way a host
 * with several cores runs it behind its load balancer (README, "Scale": the API is stateless and
 * sessions live in MariaDB). Only the bench uses this; `npm run serve` is one process.
 */
import cluster from 'node:cluster';

const processes = Math.max(1, Number(process.env.BENCH_API_PROCESSES ?? 1));

if (cluster.isPrimary) {
  for (let i = 0; i < processes; i++) cluster.fork();
  const stop = (): void => {
    for (const worker of Object.values(cluster.workers ?? {})) worker?.kill('SIGTERM');
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
  cluster.on('exit', (_worker, code) => {
    if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(code ?? 0);
  });
} else {
  await import('../../api/server');
}
