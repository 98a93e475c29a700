/**
 * CPU time of a process (user + system, ms) from /proc. On a machine shared with other work the
 * wall-clock rate of a load test says more about the neighbours than about the app; CPU time per
 * request still says what the cores would serve if the app had them alone.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';

const TICK_MS = 10; // USER_HZ is 100 on Linux.

/** Fields after the ")" that closes the command name: ppid is the 2nd, utime and stime the 12th and 13th. */
function stat(pid: string): string[] | null {
  try {
    return readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
  } catch {
    return null;
  }
}

/** CPU time of a process and its running children (cluster workers), ms; null off Linux. */
export function processCpuMs(pid: number): number | null {
  if (!existsSync(`/proc/${pid}/stat`)) return null;
  let total = 0;
  for (const entry of readdirSync('/proc').filter((e) => /^\d+$/.test(e))) {
    const fields = stat(entry);
    if (fields && (entry === String(pid) || fields[1] === String(pid))) total += (Number(fields[11]) + Number(fields[12])) * TICK_MS;
  }
  return total;
}

/** CPU of this process (the load generator), ms. */
export const ownCpuMs = (): number => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};
