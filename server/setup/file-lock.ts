// A lock between Lanewright processes on one machine (two `npm test` runs in one clone, or `npm start`
// racing `npm test` to create the cluster). mkdir is atomic; the owner's pid inside lets a lock left by a
// killed process be taken over.
import { mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { say } from './log';

function ownerAlive(lockDir: string): { alive: boolean; pid?: number } {
  let pid: number;
  try {
    pid = Number(readFileSync(join(lockDir, 'pid'), 'utf8'));
  } catch {
    // Just created by another process that has not written its pid yet.
    return { alive: true };
  }
  if (!Number.isInteger(pid) || pid <= 0) return { alive: false };
  try {
    process.kill(pid, 0);
    return { alive: true, pid };
  } catch (error) {
    return { alive: (error as NodeJS.ErrnoException).code === 'EPERM', pid };
  }
}

/** Waits for the lock, then returns its release function (also run when the process exits). */
export async function acquireLock(lockDir: string, purpose: string): Promise<() => void> {
  let announced = false;
  let pidlessSince: number | undefined;
  mkdirSync(dirname(lockDir), { recursive: true });
  for (;;) {
    try {
      mkdirSync(lockDir);
      writeFileSync(join(lockDir, 'pid'), String(process.pid));
      break;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    }
    const owner = ownerAlive(lockDir);
    pidlessSince = owner.pid === undefined && owner.alive ? (pidlessSince ?? Date.now()) : undefined;
    const stalePidless = pidlessSince !== undefined && Date.now() - pidlessSince > 5_000;
    if (!owner.alive || stalePidless) {
      rmSync(lockDir, { recursive: true, force: true });
      pidlessSince = undefined;
      continue;
    }
    if (!announced) {
      say(`waiting: ${purpose} is in progress in another process${owner.pid ? ` (pid ${owner.pid})` : ''}`);
      announced = true;
    }
    await sleep(300);
  }
  let released = false;
  const release = () => {
    if (released) return;
    released = true;
    process.off('exit', release);
    rmSync(lockDir, { recursive: true, force: true });
  };
  process.on('exit', release);
  return release;
}
