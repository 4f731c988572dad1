// `basinquota serve`: build, serve the site on localhost only, rebuild when the config or an input changes.
import { watch } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { buildProject } from './build-project.js';
import { serveStatic } from './static-server.js';

/** Folders of a project whose changes never trigger a rebuild (outputs and caches). */
const IGNORED = ['_site', 'archive', '.basinquota-cache', '.git', 'node_modules'];

/** Serve `dir`'s report at http://127.0.0.1:PORT until interrupted; rebuilds on changes. Resolves only when the server stops. */
export async function serveCommand(dir: string, options: { port: number; config?: string; out?: string }, log: (line: string) => void): Promise<number> {
  const out = options.out ?? join(dir, '_site');
  const first = await buildProject({ dir, config: options.config, out, log });
  if (first.code !== 0) return first.code;
  const server = await serveStatic(out, options.port);
  log(`serving ${out} at ${server.origin}/ (localhost only); press Ctrl-C to stop`);
  let timer: NodeJS.Timeout | undefined;
  let building = false;
  let again = false;
  const rebuild = async (): Promise<void> => {
    if (building) {
      again = true;
      return;
    }
    building = true;
    do {
      again = false;
      log('change seen: rebuilding');
      await buildProject({ dir, config: options.config, out, log });
    } while (again);
    building = false;
  };
  const watcher = watch(dir, { recursive: true }, (_event, name) => {
    if (!name) return;
    const top = relative(dir, join(dir, String(name))).split(sep)[0];
    if (IGNORED.includes(top) || top.startsWith(`${'_site'}.`)) return;
    clearTimeout(timer);
    timer = setTimeout(() => void rebuild(), 300);
  });
  await new Promise<void>((resolveStop) => {
    const stop = (): void => {
      watcher.close();
      void server.close().then(resolveStop);
    };
    process.once('SIGINT', stop);
    process.once('SIGTERM', stop);
  });
  return 0;
}
