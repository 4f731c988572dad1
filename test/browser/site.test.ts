// The demo site in real Chromium: every page loads clean, offline, accessible; hostile names stay text.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildDemoOnce, buildSite, DEMO_PATH, withTempCopy } from '../helpers/build-demo.js';
import { REPO_ROOT } from '../helpers/run-cli.js';
import { serveStatic, type StaticServer } from '../../lib/cli/static-server.js';

const CHROMIUM = '/usr/bin/chromium';
const HAVE_CHROMIUM = existsSync(CHROMIUM);
const ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const HOSTILE = '<script>alert(1)</script>';
const NAV_TIMEOUT = 20_000;

if (!HAVE_CHROMIUM && process.env.CI !== 'true') {
  console.warn(`browser tests skipped: ${CHROMIUM} not found (Debian: apt-get install chromium)`);
}

describe.runIf(!HAVE_CHROMIUM && process.env.CI === 'true')('browser tests on CI', () => {
  it('needs Chromium at /usr/bin/chromium', () => {
    throw new Error(`${CHROMIUM} not found; on CI the browser tests must run (Debian: apt-get install chromium)`);
  });
});

/** Everything one page load did wrong. */
interface LoadReport {
  /** Console errors and uncaught page errors. */
  errors: string[];
  /** Requests that failed or answered with a status of 400 or more. */
  failed: string[];
  /** Requests to any origin other than the local server. */
  foreign: string[];
  /** HTTP status of the page itself. */
  status?: number;
}

/** Open `url` in a fresh page of `context`, recording errors, failed and foreign requests. */
async function openPage(context: BrowserContext, url: string, origin: string): Promise<{ page: Page; report: LoadReport }> {
  const page = await context.newPage();
  const report: LoadReport = { errors: [], failed: [], foreign: [] };
  page.on('console', (m) => {
    // Chromium asks for /favicon.ico by itself; that request is the browser's, not the site's.
    if (m.type() === 'error' && !m.location().url.endsWith('/favicon.ico')) report.errors.push(`${m.text()} (${m.location().url})`);
  });
  page.on('pageerror', (e) => report.errors.push(e.message));
  page.on('request', (r) => {
    const u = new URL(r.url());
    if (!['data:', 'blob:', 'about:'].includes(u.protocol) && u.origin !== origin) report.foreign.push(r.url());
  });
  page.on('requestfailed', (r) => report.failed.push(`${r.url()}: ${r.failure()?.errorText ?? 'failed'}`));
  page.on('response', (r) => {
    if (r.status() >= 400) report.failed.push(`${r.url()}: HTTP ${r.status()}`);
  });
  const response = await page.goto(url, { waitUntil: 'load', timeout: NAV_TIMEOUT });
  report.status = response?.status() ?? 0;
  return { page, report };
}

/** Internal hrefs of a page (no scheme, not protocol-relative, not a bare fragment), resolved to URLs without fragment. */
async function internalLinks(page: Page): Promise<string[]> {
  const hrefs = await page.$$eval('a[href], link[href]', (els) => els.map((e) => e.getAttribute('href') ?? ''));
  return hrefs
    .filter((h) => h !== '' && !h.startsWith('#') && !h.startsWith('//') && !/^[a-z][a-z0-9+.-]*:/i.test(h))
    .map((h) => {
      const u = new URL(h, page.url());
      u.hash = '';
      return u.href;
    });
}

describe.runIf(HAVE_CHROMIUM)('demo site in Chromium', () => {
  let browser: Browser;
  let strict: BrowserContext;
  let open: BrowserContext;
  let server: StaticServer;
  let hostileServer: StaticServer;
  const pages = new Map<string, LoadReport>();
  const links = new Set<string>();
  let axeSource: string;
  /** Crawled pages that exist (broken links are reported by their own test). */
  const served = (): string[] => [...pages].filter(([, r]) => r.status === 200).map(([u]) => u);

  beforeAll(async () => {
    const hostileProject = withTempCopy(DEMO_PATH);
    injectHostileCruise(hostileProject);
    const [site, hostileSite] = await Promise.all([buildDemoOnce(), buildSite(hostileProject, 'hostile')]);
    server = await serveStatic(site);
    hostileServer = await serveStatic(hostileSite);
    browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ARGS, timeout: 30_000 });
    const viewport = { width: 1280, height: 900 };
    strict = await browser.newContext({ viewport });
    // The pages' CSP forbids all scripts; axe must be injected, and an escaping bug must not hide behind the CSP.
    open = await browser.newContext({ viewport, bypassCSP: true });
    axeSource = readFileSync(join(REPO_ROOT, 'node_modules', 'axe-core', 'axe.min.js'), 'utf8');

    // Crawl every .html page reachable from index.html.
    const queue = [`${server.origin}/index.html`];
    while (queue.length > 0) {
      const url = queue.shift()!;
      if (pages.has(url)) continue;
      const { page, report } = await openPage(strict, url, server.origin);
      pages.set(url, report);
      if (report.status !== 200) {
        await page.close();
        continue;
      }
      for (const link of await internalLinks(page)) {
        links.add(link);
        if (new URL(link).pathname.endsWith('.html') && !pages.has(link)) queue.push(link);
      }
      await page.close();
    }
  }, 300_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
    await hostileServer?.close();
  });

  it('crawl from index.html reaches the Overview and Inventory pages', () => {
    const paths = [...pages.keys()].map((u) => new URL(u).pathname);
    expect(paths).toContain('/index.html');
    expect(paths).toContain('/inventory.html');
  });

  it('every page loads with no console errors, no failed requests and no request off the local server', () => {
    for (const [url, report] of pages) expect({ url, ...report }).toEqual({ url, errors: [], failed: [], foreign: [], status: 200 });
  });

  it('every internal link resolves to an existing file (HTTP 200)', async () => {
    expect(links.size).toBeGreaterThan(1);
    const broken: string[] = [];
    for (const link of links) {
      const res = await fetch(link, { method: 'HEAD', signal: AbortSignal.timeout(5_000) });
      if (res.status !== 200) broken.push(`${link}: ${res.status}`);
    }
    expect(broken).toEqual([]);
  });

  it('every figure svg/img on every page is visible with a non-zero size', async () => {
    for (const url of served()) {
      const page = await strict.newPage();
      await page.goto(url, { waitUntil: 'load', timeout: NAV_TIMEOUT });
      for (const figure of await page.locator('figure svg, figure img').all()) {
        const where = `${url}: ${await figure.evaluate((e) => e.outerHTML.slice(0, 80))}`;
        await figure.scrollIntoViewIfNeeded({ timeout: 5_000 });
        expect(await figure.isVisible(), where).toBe(true);
        const box = await figure.boundingBox();
        expect(box && box.width > 0 && box.height > 0, where).toBe(true);
        const natural = await figure.evaluate((e) => {
          // The callback runs in the page; the project's tsconfig has no DOM types, so name only what is used.
          const img = e as unknown as { tagName: string; complete: boolean; naturalWidth: number };
          return img.tagName.toLowerCase() !== 'img' || (img.complete && img.naturalWidth > 0);
        });
        expect(natural, `${where} did not decode`).toBe(true);
      }
      await page.close();
    }
  }, 60_000);

  it('axe-core finds no serious or critical violations on any page', async () => {
    const found: string[] = [];
    for (const url of served()) {
      const page = await open.newPage();
      await page.goto(url, { waitUntil: 'load', timeout: NAV_TIMEOUT });
      await page.addScriptTag({ content: axeSource });
      const violations = await page.evaluate(async () => {
        const page = globalThis as unknown as { document: unknown; axe: { run(ctx: unknown, opts: object): Promise<{ violations: { id: string; impact: string | null; nodes: { target: unknown[] }[] }[] }> } };
        const result = await page.axe.run(page.document, { resultTypes: ['violations'] });
        return result.violations.map((v) => ({ id: v.id, impact: v.impact, targets: v.nodes.slice(0, 3).map((n) => JSON.stringify(n.target)) }));
      });
      for (const v of violations) if (v.impact === 'serious' || v.impact === 'critical') found.push(`${url}: ${v.id} (${v.impact}) at ${v.targets.join(', ')}`);
      await page.close();
    }
    expect(found).toEqual([]);
  }, 60_000);

  it('saves the Overview screenshot to docs/overview.png (1280×900)', async () => {
    const page = await strict.newPage();
    await page.goto(`${server.origin}/index.html`, { waitUntil: 'load', timeout: NAV_TIMEOUT });
    const png = await page.screenshot({ fullPage: false, type: 'png', animations: 'disabled' });
    await page.close();
    // PNG IHDR: width and height as big-endian 32-bit integers at bytes 16 and 20.
    expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([1280, 900]);
    mkdirSync(join(REPO_ROOT, 'docs'), { recursive: true });
    writeFileSync(join(REPO_ROOT, 'docs', 'overview.png'), png);
  });

  it('a cruise named <script>alert(1)</script> shows literally on the Inventory page and runs nothing', async () => {
    const { page, report } = await openPage(open, `${hostileServer.origin}/inventory.html`, hostileServer.origin);
    const dialogs: string[] = [];
    page.on('dialog', (d) => {
      dialogs.push(d.message());
      void d.dismiss();
    });
    await page.reload({ waitUntil: 'load', timeout: NAV_TIMEOUT });
    const cell = page.locator('td', { hasText: HOSTILE });
    expect(await cell.count()).toBeGreaterThan(0);
    const bodyText = await page.locator('body').textContent({ timeout: 5_000 });
    expect(bodyText).toContain(HOSTILE);
    expect(await page.locator('body script').count()).toBe(0);
    expect(dialogs).toEqual([]);
    expect(report.errors).toEqual([]);
    await page.close();
  });
});

/** Rename cruise TH2308 to a script tag in its bottle and cell files (the cruise is a column in both). */
function injectHostileCruise(project: string): void {
  const edit = (file: string, from: RegExp, to: string): void => {
    const path = join(project, file);
    const text = readFileSync(path, 'utf8');
    const changed = text.replace(from, to);
    if (changed === text) throw new Error(`${file}: cruise TH2308 not found`);
    writeFileSync(path, changed);
  };
  edit('samples/TH2308_bottles.csv', /^TH2308,/gm, `${HOSTILE},`);
  edit('cells/TH2308_cells.csv', /,TH2308,/g, `,${HOSTILE},`);
}
