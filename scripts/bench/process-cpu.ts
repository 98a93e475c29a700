/**
 * CPU time of a process (user + system, ms) from /proc. On a machine shared with other work the
 * wall-clock rate of a load test says more about the neighbours than about the app; CPU time per
 * request still says what the cores would serve if the app had them alone.
 */
import { existsSync, readFileSync } from 'node:fs';

const TICK_MS = 10; // USER_HZ is 100 on Linux.

export function processCpuMs(pid: number): number | null {
  const file = `/proc/${pid}/stat`;
  if (!existsSync(file)) return null;
  // Fields after the ")" that closes the command name: utime and stime are the 12th and 13th.
  const fields = readFileSync(file, 'utf8').split(') ')[1].split(' ');
  return (Number(fields[11]) + Number(fields[12])) * TICK_MS;
}

/** CPU of this process (the load generator), ms. */
export const ownCpuMs = (): number => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};
