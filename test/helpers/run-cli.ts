// Run the real basinquota command line in a child process, as a user would.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/** The repository root (the folder holding package.json and bin/). */
export const REPO_ROOT = fileURLToPath(new URL('../../', import.meta.url));

/** What one command-line run returned: exit code and everything it printed. */
export interface CliRun {
  /** Process exit code (null when killed by a signal). */
  code: number | null;
  /** Everything written to standard output. */
  stdout: string;
  /** Everything written to standard error (progress, warnings, errors). */
  stderr: string;
}

/** Run `node bin/basinquota.js ...args` from the repository root with SOURCE_DATE_EPOCH unset. */
export function runCli(args: string[], timeoutMs = 120_000): Promise<CliRun> {
  const env = { ...process.env };
  // The build date must come from the newest input, not from the environment.
  delete env.SOURCE_DATE_EPOCH;
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['bin/basinquota.js', ...args], { cwd: REPO_ROOT, env, timeout: timeoutMs });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => (stdout += chunk));
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}
