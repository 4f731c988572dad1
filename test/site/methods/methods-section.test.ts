import { beforeAll, describe, expect, it } from 'vitest';
import type { Config } from '../../../lib/config/index.js';
import type { PipelineResult } from '../../../lib/pipeline/index.js';
import { methodsSection, REFERENCES, type MethodsSection } from '../../../lib/site/methods/index.js';
import { demoResult } from './demo-result.js';

let demo: { result: PipelineResult; config: Config };
let section: MethodsSection;

beforeAll(async () => {
  demo = await demoResult();
  section = methodsSection(demo.result, demo.config);
}, 180_000);

const ids = (s: MethodsSection): string[] => s.references.map((r) => r.id);

describe('methodsSection(result, config)', () => {
  it('lists the stages that ran in pipeline order', () => {
    expect(section.stages.map((s) => s.id)).toEqual(['load', 'harmonise', 'match', 'crossover', 'quotas', 'fits', 'regions', 'anomalies', 'fe-star']);
  });

  it('cites the methods the demo uses: its config names IOC and WOCE flags, pressure in dbar, MDL and Redfield carbon, all four fits', () => {
    expect(ids(section)).toEqual(expect.arrayContaining(['ioc2013', 'joyce1994', 'fofonoff1983', 'menden-deuer2000', 'redfield1963', 'york2004', 'warton2006', 'burnham2002', 'benjamini1995', 'parekh2005']));
  });

  it('counts matched cells by source, summing to the cell table', () => {
    const table = section.stages.find((s) => s.id === 'match')!.tables[0];
    expect(table.rows.map((r) => r[0]).slice(0, 4)).toEqual(['bottle', 'bottle-interpolated', 'grid', 'none']);
    expect(table.rows.reduce((sum, r) => sum + Number(r[1]), 0)).toBe(demo.result.cells.numRows());
  });

  it('reports each conversion with the rows it affected, from the harmonise summaries', () => {
    const rows = section.stages.find((s) => s.id === 'harmonise')!.tables[0].rows;
    const total = demo.result.harmonise.reduce((s, h) => s + h.conversions.reduce((t, c) => t + c.rows, 0), 0);
    expect(rows.reduce((s, r) => s + Number(r[5]), 0)).toBe(total);
    expect(rows.some((r) => r[2] === 'dbar' && r[3] === 'm')).toBe(true);
  });

  it('gives the bootstrap n and seed the fits used', () => {
    const p = section.stages.find((s) => s.id === 'fits')!.parameters.find((x) => x.name === 'Bootstrap')!;
    const o = demo.result.fits!.options;
    expect(p.value).toBe(`${o.bootstrap.n} station resamples, seed ${o.bootstrap.seed}`);
  });

  it('renders formulas as MathML with no script', () => {
    const formulas = section.stages.flatMap((s) => s.formulas);
    expect(formulas.length).toBeGreaterThan(8);
    for (const f of formulas) {
      expect(f.mathml).toContain('<math');
      expect(f.mathml).not.toMatch(/<script/i);
      expect(f.mathml).not.toContain('merror');
    }
  });

  it('gives every reference an id and either a DOI or an explicit note', () => {
    for (const r of section.references) {
      expect(r.id).toMatch(/^[a-z][a-z0-9-]*$/);
      expect(r.doi !== null || (r.doiNote ?? '').length > 0).toBe(true);
      expect(r.doi === null || r.doiNote === null).toBe(true);
    }
  });

  it('lists each reference once and only references some stage cites', () => {
    const cited = new Set(section.stages.flatMap((s) => s.references));
    expect(new Set(ids(section)).size).toBe(section.references.length);
    expect([...cited].sort()).toEqual([...ids(section)].sort());
  });

  it('drops York when the config fits no York model', async () => {
    const { result, config } = await demoResult((c) => {
      c.fits.models = ['ols', 'sma'];
      c.fits.bootstrap.n = 0;
    });
    const s = methodsSection(result, config);
    expect(ids(s)).not.toContain('york2004');
    expect(ids(s)).toContain('warton2006');
  }, 180_000);

  it('drops Redfield when no class takes carbon from phosphorus', async () => {
    const { result, config } = await demoResult((c) => {
      for (const cls of Object.values(c.classes)) if (cls.carbon === 'phosphorus') cls.carbon = 'biovolume-protist';
      c.fits.bootstrap.n = 0;
    });
    const s = methodsSection(result, config);
    expect(ids(s)).not.toContain('redfield1963');
    expect(ids(s)).toContain('menden-deuer2000');
  }, 180_000);
});

describe('methodsSection(result, config) purity', () => {
  it('leaves the config and the fit options untouched and gives the same section twice', () => {
    const before = JSON.stringify([demo.config, demo.result.fits?.options, demo.result.harmonise]);
    const again = methodsSection(demo.result, demo.config);
    expect(JSON.stringify([demo.config, demo.result.fits?.options, demo.result.harmonise])).toBe(before);
    expect(JSON.stringify(again)).toBe(JSON.stringify(section));
  });
});

describe('REFERENCES', () => {
  it('holds the DOIs as published', () => {
    // Menden-Deuer & Lessard 2000, Limnol. Oceanogr. 45:569; Benjamini & Hochberg 1995, JRSS B 57:289; York et al. 2004, Am. J. Phys. 72:367.
    expect(REFERENCES['menden-deuer2000'].doi).toBe('10.4319/lo.2000.45.3.0569');
    expect(REFERENCES.benjamini1995.doi).toBe('10.1111/j.2517-6161.1995.tb02031.x');
    expect(REFERENCES.york2004.doi).toBe('10.1119/1.1632486');
    // Redfield et al. 1963 is a chapter of The Sea vol. 2: it has no DOI.
    expect(REFERENCES.redfield1963.doi).toBeNull();
  });
});
