import { readdirSync, readFileSync } from 'node:fs';

/** USER_HZ on Linux: /proc/<pid>/stat counts CPU time in these ticks. */
const TICKS_PER_S = 100;

interface ProcStat {
  pid: number;
  ppid: number;
  /** utime + stime, seconds. */
  ownS: number;
  /** cutime + cstime (children that have exited and been waited for), seconds. */
  childrenS: number;
}

function procStat(pid: number | string): ProcStat | null {
  try {
    // The command name may hold spaces: the fields start after its closing parenthesis.
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').replace(/^.*\) /, '').split(' ');
    return {
      pid: Number(pid),
      ppid: Number(fields[1]),
      ownS: (Number(fields[11]) + Number(fields[12])) / TICKS_PER_S,
      childrenS: (Number(fields[13]) + Number(fields[14])) / TICKS_PER_S,
    };
  } catch {
    return null; // gone, or not Linux
  }
}

/** CPU seconds (user + system) one process has used so far; NaN when it can not be read. */
export function processCpuS(pid: number): number {
  return procStat(pid)?.ownS ?? NaN;
}

/**
 * CPU seconds of a process and its direct children (the PostgreSQL postmaster and its backends),
 * counting children that have already exited through the parent's cutime/cstime.
 */
export function treeCpuS(rootPid: number): number {
  const root = procStat(rootPid);
  if (!root) return NaN;
  let total = root.ownS + root.childrenS;
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    const stat = procStat(entry);
    if (stat && stat.ppid === rootPid) total += stat.ownS;
  }
  return total;
}

/** The PostgreSQL postmaster's pid from a cluster's data directory (first line of postmaster.pid). */
export function postmasterPid(dataDir: string): number {
  return Number(readFileSync(`${dataDir}/postmaster.pid`, 'utf8').split('\n')[0]);
}

/** CPU seconds every process on the machine has used (all cores; /proc/stat less idle and iowait). */
export function machineCpuS(): number {
  try {
    const [, ...ticks] = readFileSync('/proc/stat', 'utf8').split('\n')[0].trim().split(/\s+/).map(Number);
    // idle and iowait (the 4th and 5th) are time no process used.
    const [user, nice, system, , , irq, softirq, steal] = ticks;
    return (user + nice + system + irq + softirq + steal) / TICKS_PER_S;
  } catch {
    return NaN;
  }
}

/** This process's own CPU seconds (the load generator runs in it). */
export function selfCpuS(): number {
  const usage = process.cpuUsage();
  return (usage.user + usage.system) / 1e6;
}

/** Named CPU-seconds readers, read before and after a run: how many cores each one kept busy on average. */
export type CpuReaders = Record<string, () => number>;

export async function coresDuring<T>(readers: CpuReaders, work: () => Promise<T>): Promise<{ result: T; cores: Record<string, number>; seconds: number }> {
  const before = Object.fromEntries(Object.entries(readers).map(([name, read]) => [name, read()]));
  const started = performance.now();
  const result = await work();
  const seconds = (performance.now() - started) / 1000;
  const cores = Object.fromEntries(Object.entries(readers).map(([name, read]) => [name, (read() - before[name]) / seconds]));
  return { result, cores, seconds };
}

/** "server 0.93, postgres 0.41, load generator 0.62 cores" from coresDuring's numbers. */
export function describeCores(cores: Record<string, number>): string {
  return `${Object.entries(cores)
    .map(([name, value]) => `${name} ${Number.isFinite(value) ? value.toFixed(2) : '?'}`)
    .join(', ')} cores`;
}
