// Processor time by where it is spent, read from Linux's /proc: the engine's Web Workers, the
// browser's compiler and garbage-collector threads, the page's own thread, the rest of Chromium, this
// Node process (the app's server) and PostgreSQL. A study in the browser shares the machine's cores
// with all of them, so this is what decides how much a second worker can add. Threads are told apart
// by id, so a thread that ends between two readings does not take time off the others.
import { readdirSync, readFileSync } from 'node:fs';

export type CpuReading = Map<string, number>;

const TICKS_PER_SECOND = 100;

function group(cmdline: string, thread: string, pid: string): string | null {
  if (pid === String(process.pid)) return 'app server (Node)';
  if (cmdline.includes('postgres')) return 'PostgreSQL';
  if (!cmdline.includes('chromium')) return null;
  if (!cmdline.includes('--type=renderer')) return 'Chromium, other processes';
  if (thread.startsWith('DedicatedWorker')) return 'engine workers';
  if (thread.startsWith('ThreadPoolForeg')) return 'compiler and GC threads';
  if (thread === 'chromium' || thread.startsWith('CrRendererMain')) return 'page thread';
  return 'Chromium, other threads';
}

const readOr = (path: string) => {
  try {
    return readFileSync(path, 'utf8');
  } catch {
    return null;
  }
};

/** Seconds of processor time so far, by thread (key: group and thread id). */
export function readCpu(): CpuReading {
  const out: CpuReading = new Map();
  for (const pid of readdirSync('/proc').filter((d) => /^\d+$/.test(d))) {
    const cmdline = readOr(`/proc/${pid}/cmdline`);
    if (!cmdline) continue;
    let tids: string[];
    try {
      tids = readdirSync(`/proc/${pid}/task`);
    } catch {
      continue;
    }
    for (const tid of tids) {
      const stat = readOr(`/proc/${pid}/task/${tid}/stat`);
      if (!stat) continue;
      const name = stat.slice(stat.indexOf('(') + 1, stat.lastIndexOf(')'));
      const where = group(cmdline, name, pid);
      if (!where) continue;
      // Fields after the name: state is the first, utime and stime the 12th and 13th.
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      out.set(`${where}|${tid}`, (Number(fields[11]) + Number(fields[12])) / TICKS_PER_SECOND);
    }
  }
  return out;
}

/** Processor seconds spent between two readings, by group, largest first. */
export function cpuBetween(before: CpuReading, after: CpuReading): [string, number][] {
  const byGroup = new Map<string, number>();
  for (const [key, seconds] of after) {
    const where = key.slice(0, key.indexOf('|'));
    byGroup.set(where, (byGroup.get(where) ?? 0) + seconds - (before.get(key) ?? 0));
  }
  return [...byGroup].sort((a, b) => b[1] - a[1]);
}
