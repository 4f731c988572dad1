// A small static file server bound to 127.0.0.1 (never another interface): `basinquota serve` and the browser tests use it.
import { createReadStream, statSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { extname, join, normalize, resolve, sep } from 'node:path';

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.csv': 'text/csv; charset=utf-8',
  '.json': 'application/json',
  '.zip': 'application/zip',
  '.js': 'text/javascript',
  '.woff2': 'font/woff2',
};

/** A running static server: its origin (`http://127.0.0.1:PORT`) and a close function. */
export interface StaticServer {
  /** Origin without trailing slash. */
  origin: string;
  /** Stop listening; resolves when closed. */
  close(): Promise<void>;
}

/** Serve the files under `root` on 127.0.0.1 (port 0 = any free port; GET and HEAD; `/` is index.html; 404 outside root or when missing). */
export async function serveStatic(root: string, listenPort = 0): Promise<StaticServer> {
  const base = resolve(root);
  const server: Server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    let rel = decodeURIComponent(url.pathname);
    if (rel.endsWith('/')) rel += 'index.html';
    const path = normalize(join(base, rel));
    let size = -1;
    try {
      if (path === base || path.startsWith(base + sep)) size = statSync(path).isFile() ? statSync(path).size : -1;
    } catch {
      size = -1;
    }
    if (size < 0) {
      res.writeHead(404, { 'content-type': 'text/plain' }).end('not found');
      return;
    }
    res.writeHead(200, { 'content-type': TYPES[extname(path)] ?? 'application/octet-stream', 'content-length': size });
    if (req.method === 'HEAD') res.end();
    else createReadStream(path).pipe(res);
  });
  await new Promise<void>((ok) => server.listen(listenPort, '127.0.0.1', ok));
  const { port } = server.address() as AddressInfo;
  return {
    origin: `http://127.0.0.1:${port}`,
    close: () => new Promise((ok) => server.close(() => ok())),
  };
}
