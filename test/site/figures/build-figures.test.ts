// buildFigures and pageSections on the demo project: ids, captions, files, caution, determinism and page size.
import { beforeAll, describe, expect, it } from 'vitest';
import { fileURLToPath } from 'node:url';
import { readProject } from '../../../lib/cli/read-project.js';
import { runPipeline, type PipelineResult } from '../../../lib/pipeline/index.js';
import { createRenderer } from '../../../lib/figures/index.js';
import type { Config } from '../../../lib/config/index.js';
import type { FigureEntry } from '../../../lib/site/figure-entry.js';
import type { ExtraFile } from '../../../lib/site/extra-file.js';
import { buildFigures, CARBON_PER_IRON_CAUTION, pageSections, sig } from '../../../lib/site/figures/index.js';
import { testFont } from '../../figures/font-fixture.js';

const renderer = createRenderer(testFont);
let result: PipelineResult;
let config: Config;
let built: { entries: FigureEntry[]; files: ExtraFile[] };

beforeAll(async () => {
  const project = readProject(fileURLToPath(new URL('../../../data/demo', import.meta.url)));
  config = project.inputs!.config;
  result = runPipeline(project.inputs!);
  built = await buildFigures(result, config, renderer, { dpi: [] });
});

const byId = (id: string) => built.entries.find((e) => e.id === id)!;

describe('buildFigures(result, config, renderer) on the demo', () => {
  it('gives every figure an id, a page, a caption, alt text and an SVG', () => {
    expect(built.entries.length).toBeGreaterThanOrEqual(15);
    for (const e of built.entries) {
      expect(e.id).toMatch(/^[a-z0-9-]+$/);
      expect(['fields', 'quotas', 'anomalies']).toContain(e.page);
      expect(e.caption.length).toBeGreaterThan(20);
      expect(e.alt.length).toBeGreaterThan(10);
      expect(e.svg.startsWith('<svg')).toBe(true);
      expect(e.svg.trimEnd().endsWith('</svg>')).toBe(true);
    }
  });

  it('uses unique ids', () => {
    const ids = built.entries.map((e) => e.id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('draws dFe and nitrate at every configured depth, Fe*, the polar map and the HNLC outline', () => {
    for (const d of config.figures.depths_m) {
      expect(byId(`dfe-map-${d}m`)).toBeDefined();
      expect(byId(`nitrate-map-${d}m`).svg).toContain('class="outline"');
    }
    expect(byId('fe-star-map').caption).toContain('0.470 mmol mol⁻¹');
    expect(byId('south-polar-dfe-map')).toBeDefined();
  });

  it('writes an SVG and a CSV with a header for every figure, and a spec for plots', () => {
    const paths = new Set(built.files.map((f) => f.path));
    for (const e of built.entries) {
      expect(paths.has(`supplement/figures/${e.id}.svg`)).toBe(true);
      const csv = built.files.find((f) => f.path === `supplement/figures/${e.id}.csv`);
      expect(typeof csv?.data).toBe('string');
      const [header, first] = String(csv?.data).split('\n');
      expect(header).toMatch(/^[a-z][a-z0-9_]*(,[a-z][a-z0-9_]*)+$/);
      expect(first.length).toBeGreaterThan(0);
      expect(e.files.map((f) => f.href)).toContain(`supplement/figures/${e.id}.csv`);
    }
    expect(paths.has('supplement/figures/fe-c-vs-dfe.spec.json')).toBe(true);
    expect(paths.has('supplement/figures/station-map.spec.json')).toBe(false);
    expect([...paths].some((p) => p.endsWith('.png'))).toBe(false);
  });

  it('puts the caution on the C:Fe efficiency figure only', () => {
    expect(byId('c-fe-efficiency').caution).toBe(CARBON_PER_IRON_CAUTION);
    expect(CARBON_PER_IRON_CAUTION).toContain('London Protocol');
    expect(built.entries.filter((e) => e.caution !== null).map((e) => e.id)).toEqual(['c-fe-efficiency']);
  });

  it("writes each class's fitted exponent and interval into the Fe:C caption", () => {
    const caption = byId('fe-c-vs-dfe').caption;
    for (const c of result.fits!.classes) {
      if (!c.fitted) continue;
      const m = c.models.find((x) => x.model === c.primary);
      if (!m || !m.fitted || m.model === 'saturating') continue;
      expect(caption).toContain(`${c.class} (${m.model}): exponent ${sig(m.parameters.exponent.estimate)} (95 % CI ${sig(m.parameters.exponent.interval.lower)}–`);
    }
    expect(caption).toContain(`${result.cells.numRows()} cells`);
  });

  it('names the flagged regions with fold and station count in the residual map caption', () => {
    const flagged = result.anomalies!.groups.filter((g) => g.flag === 'lower-than-fit' || g.flag === 'higher-than-fit');
    expect(flagged.length).toBeGreaterThan(0);
    const caption = byId('residual-map').caption;
    for (const g of flagged) expect(caption).toContain(`${g.phytoClass} ${sig(g.fold, 2)}× (`);
    expect(caption).toContain(`${flagged[0].nStations} stations`);
    expect(byId('residual-map').svg).toContain('stroke-width="1.4"');
  });

  it("keeps each page's inline SVG within 1 MB", () => {
    for (const page of ['fields', 'quotas', 'anomalies']) {
      const total = built.entries.filter((e) => e.page === page).reduce((s, e) => s + Buffer.byteLength(e.svg), 0);
      expect(total, page).toBeLessThanOrEqual(1_000_000);
    }
  });

  it('gives identical SVG bytes for the same inputs and names PNGs by width and dpi', async () => {
    const again = await buildFigures(result, config, renderer, { pngWidthsMm: [10], dpi: [72] });
    expect(again.entries.map((e) => e.svg)).toEqual(built.entries.map((e) => e.svg));
    expect(again.entries.map((e) => e.caption)).toEqual(built.entries.map((e) => e.caption));
    const png = again.files.find((f) => f.path === 'supplement/figures/station-map-10mm-72dpi.png');
    expect(png?.data).toBeInstanceOf(Uint8Array);
    expect(Array.from((png!.data as Uint8Array).slice(1, 4))).toEqual([0x50, 0x4e, 0x47]);
  });
});

describe('pageSections(result, config) on the demo', () => {
  it('lists the grids with their lattice sizes', () => {
    const s = pageSections(result, config);
    expect(s.fields.grids.map((g) => g.quantity)).toEqual(result.grids.map((g) => g.quantity));
    expect(s.fields.grids[0]).toMatchObject({ file: 'grids/dfe_climatology.nc', nLon: 72, nLat: 36 });
  });

  it('gives every class its models with intervals, the primary marked, and the ANCOVA', () => {
    const q = pageSections(result, config).quotas!;
    expect(q.classes.map((c) => c.phytoClass)).toEqual([...result.fits!.classes.map((c) => c.class), 'all']);
    const diatom = q.classes.find((c) => c.phytoClass === 'diatom')!;
    const ols = diatom.models.find((m) => m.model === 'ols')!;
    expect(ols.primary).toBe(true);
    expect(ols.exponent!.lower).toBeLessThan(ols.exponent!.estimate);
    expect(ols.exponent!.upper).toBeGreaterThan(ols.exponent!.estimate);
    expect(diatom.models.find((m) => m.model === 'saturating')?.qmax).not.toBeNull();
    expect(q.ancova?.equalSlopes.df1).toBe(3);
  });

  it('sorts the anomaly rows with the flagged groups first', () => {
    const rows = pageSections(result, config).anomalies!.rows;
    expect(rows).toHaveLength(result.anomalies!.groups.length);
    const firstUnflagged = rows.findIndex((r) => !r.flagged);
    expect(rows.slice(0, firstUnflagged).every((r) => r.flagged)).toBe(true);
    expect(rows.slice(firstUnflagged).some((r) => r.flagged)).toBe(false);
    expect(rows[0].mostInfluential).toMatch(/ \/ /);
  });
});

describe('demo figure snapshots', () => {
  it('each demo figure’s SVG and Vega-Lite spec match the committed snapshots (review their diffs on purpose)', async () => {
    for (const e of built.entries) {
      await expect(e.svg, e.id).toMatchFileSnapshot(`__snapshots__/demo/${e.id}.svg`);
      const spec = built.files.find((f) => f.path === `supplement/figures/${e.id}.spec.json`);
      if (spec) await expect(String(spec.data), e.id).toMatchFileSnapshot(`__snapshots__/demo/${e.id}.spec.json`);
    }
  });
});
