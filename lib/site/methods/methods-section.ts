// The Methods section from the config and the pipeline result: every stage that ran and the references it cites.
import type { Config } from '../../config/index.js';
import type { PipelineResult } from '../../pipeline/index.js';
import { DEFAULT_PICOCYANOBACTERIA_FACTOR } from '../../quotas/index.js';
import { anomalyStage, feStarStage, fitStage, regionStage } from './analysis-stages.js';
import { crossoverStage, harmoniseStage, loadStage, matchStage } from './data-stages.js';
import type { MethodStage, MethodsSection } from './methods-model.js';
import { quotaStage } from './quota-stage.js';
import type { Reference } from './reference.js';
import { REFERENCES, userReference, type ReferenceId } from './references.js';

/** Site paths of the reference files the lead writes from `methodsFiles`. */
export const REFERENCE_FILES = { bibtex: 'supplement/references.bib', cslJson: 'supplement/references.json' } as const;

/** Resolve a stage's reference id; "user:carbon-factor" becomes the configured factor's citation. */
function resolve(id: string, config: Config): Reference {
  if (id === 'user:carbon-factor') {
    const f = config.carbon.factor_fg_per_um3;
    return userReference('carbon-factor', f ? f.citation : DEFAULT_PICOCYANOBACTERIA_FACTOR.citation);
  }
  return REFERENCES[id as ReferenceId];
}

/**
 * Method notes of a run: the stages that ran (load, harmonise, match, crossover, quotas, fits, regions, anomalies, Fe*)
 * with their parameters, counts and formulas (MathML), and the references of the methods used, each once.
 */
export function methodsSection(result: PipelineResult, config: Config): MethodsSection {
  const ran = result.harmonise.length > 0;
  const stages: MethodStage[] = [loadStage(result, config)];
  if (ran) stages.push(harmoniseStage(result, config));
  if (ran && result.cells.columnNames().includes('ambient_dissolved_fe_source')) {
    stages.push(matchStage(result, config));
    stages.push(crossoverStage(result, config));
  }
  if (result.cells.columnNames().includes('carbon_method')) stages.push(quotaStage(result, config));
  for (const s of [fitStage(result), regionStage(result, config), anomalyStage(result), ran ? feStarStage(result, config) : null]) if (s) stages.push(s);
  const references: Reference[] = [];
  const seen = new Set<string>();
  for (const stage of stages) {
    stage.references = stage.references.map((id) => {
      const ref = resolve(id, config);
      if (!seen.has(ref.id)) {
        seen.add(ref.id);
        references.push(ref);
      }
      return ref.id;
    });
  }
  return { stages, references, files: { ...REFERENCE_FILES } };
}
