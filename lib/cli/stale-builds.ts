// Leftovers of builds that were killed: `<out>.tmp-<pid>` (a half-written site) and `<out>.old-<pid>` (the previous site mid-swap).
import { existsSync, readdirSync, renameSync, rmSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';

/** True when a process with this id is running (signal 0 probes without sending anything). */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Before a build: restore a previous site that a killed build left renamed away (when `outDir` is missing),
 * and remove the temporary folders of builds whose process is gone.
 */
export function recoverStaleBuilds(outDir: string): void {
  const parent = dirname(outDir);
  if (!existsSync(parent)) return;
  const name = basename(outDir);
  const pattern = new RegExp(`^${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}\\.(tmp|old)-(\\d+)$`);
  for (const entry of readdirSync(parent).sort()) {
    const m = pattern.exec(entry);
    if (!m || alive(Number(m[2]))) continue;
    const path = join(parent, entry);
    if (m[1] === 'old' && !existsSync(outDir)) renameSync(path, outDir);
    else rmSync(path, { recursive: true, force: true });
  }
}
