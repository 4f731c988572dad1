// Key findings for the Overview: sentences written from the fits and anomaly results, each linked to its figure.
import type { PipelineResult } from '../pipeline/index.js';
import { interval, pRelation, sig } from './format.js';

/** One finding: its sentence and the page anchor of the figure that shows it. */
export interface KeyFinding {
  /** The sentence, plain text. */
  text: string;
  /** Site-relative link to the figure or table. */
  href: string;
  /** Words of the link. */
  linkText: string;
}

/** Where the findings link to (figure anchors on the Quotas and Anomalies pages). */
export const FINDING_LINKS = {
  fit: { href: 'quotas.html#fig-fe-c-vs-dfe', linkText: 'Fe:C against dFe' },
  classes: { href: 'quotas.html#differences', linkText: 'class comparison' },
  anomalies: { href: 'anomalies.html#fig-residual-map', linkText: 'regional anomalies' },
} as const;

const capitalise = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);

/** Sentences on each fitted class's primary fit, the class-difference test and every flagged region. */
export function keyFindings(result: PipelineResult, regionNames: Map<string, string>): KeyFinding[] {
  const out: KeyFinding[] = [];
  for (const cls of result.fits?.classes ?? []) {
    if (!cls.fitted) {
      out.push({ text: `${capitalise(cls.class)}: ${cls.nCells} cells, too few to fit (${cls.reason}).`, ...FINDING_LINKS.fit });
      continue;
    }
    const model = cls.models.find((m) => m.model === cls.primary);
    if (!model?.fitted) continue;
    const n = `n = ${cls.nCells} cells at ${cls.nStations} stations`;
    if (model.model === 'saturating') {
      const { qmax, k } = model.parameters;
      out.push({ text: `${capitalise(cls.class)} Fe:C saturates at ${sig(qmax.estimate)} µmol mol⁻¹ (95 % CI ${interval(qmax.interval.lower, qmax.interval.upper)}) with half-saturation at ${sig(k.estimate)} nmol kg⁻¹ dFe (${n}).`, ...FINDING_LINKS.fit });
    } else {
      const b = model.parameters.exponent;
      const verb = b.interval.lower > 0 ? 'rises with' : b.interval.upper < 0 ? 'falls with' : 'shows no clear trend with';
      out.push({ text: `${capitalise(cls.class)} Fe:C ${verb} dissolved Fe with exponent ${sig(b.estimate, 2)} (95 % CI ${interval(b.interval.lower, b.interval.upper, 2)}, ${n}; ${model.model.toUpperCase()} on log–log).`, ...FINDING_LINKS.fit });
    }
  }
  const slopes = result.fits?.classDifferences.ancova?.equalSlopes;
  if (slopes && Number.isFinite(slopes.p)) {
    const differ = slopes.p < 0.05;
    out.push({ text: `The classes' exponents ${differ ? 'differ' : 'do not differ detectably'} (F = ${sig(slopes.f)} on ${slopes.df1} and ${slopes.df2} df, p ${pRelation(slopes.p)}).`, ...FINDING_LINKS.classes });
  }
  const groups = result.anomalies?.groups ?? [];
  const flagged = groups.filter((g) => g.status === 'tested' && (g.flag === 'lower-than-fit' || g.flag === 'higher-than-fit'));
  const tested = groups.filter((g) => g.status === 'tested').length;
  for (const g of flagged) {
    const region = regionNames.get(g.region) ?? g.region;
    const direction = g.flag === 'lower-than-fit' ? 'less' : 'more';
    out.push({
      text: `${capitalise(g.phytoClass)} cells in ${region} hold ${direction} iron than the fit predicts: ${sig(g.fold, 2)}-fold (95 % CI ${interval(g.foldLow, g.foldHigh, 2)}; ${g.nStations} stations, ${g.nCells} cells; BH-adjusted p ${pRelation(g.pAdjusted)}).`,
      ...FINDING_LINKS.anomalies,
    });
  }
  if (tested > 0 && flagged.length === 0) out.push({ text: `None of the ${tested} tested region × class groups departs from the fit at the configured false discovery rate.`, ...FINDING_LINKS.anomalies });
  return out;
}
