import { spawn } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { makeProject } from '../corpus/make-project.js';
import { REPO_ROOT } from '../helpers/run-cli.js';

/** Resolve when `text` matches `pattern`, polling the growing output. */
function waitFor(read: () => string, pattern: RegExp, ms: number): Promise<RegExpExecArray> {
  return new Promise((resolve, reject) => {
    const start = Date.now();
    const tick = (): void => {
      const m = pattern.exec(read());
      if (m) resolve(m);
      else if (Date.now() - start > ms) reject(new Error(`timed out waiting for ${pattern}; output:\n${read()}`));
      else setTimeout(tick, 100);
    };
    tick();
  });
}

describe('basinquota serve', () => {
  it('serve DIR --port 0 serves the built site on 127.0.0.1 only and rebuilds when the config changes', async () => {
    const project = makeProject();
    const child = spawn(process.execPath, ['bin/basinquota.js', 'serve', project, '--port', '0'], { cwd: REPO_ROOT });
    let output = '';
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => (output += chunk));
    try {
      const [, origin] = await waitFor(() => output, /serving .* at (http:\/\/[^/\s]+)\//, 120_000);
      expect(new URL(origin).hostname).toBe('127.0.0.1');
      const page = await fetch(`${origin}/index.html`);
      expect(page.status).toBe(200);
      expect(await page.text()).toContain('<title>Overview');
      expect((await fetch(`${origin}/../../etc/passwd`)).status).toBe(404);
      const config = join(project, 'basinquota.yaml');
      writeFileSync(config, `${readFileSync(config, 'utf8')}# touched\n`);
      await waitFor(() => output, /change seen: rebuilding[\s\S]*wrote version 2/, 120_000);
    } finally {
      child.kill('SIGTERM');
    }
  }, 300_000);
});
