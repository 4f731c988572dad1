// The reference files of a methods section as site files.
import type { ExtraFile } from '../extra-file.js';
import type { MethodsSection } from './methods-model.js';
import { referencesBibtex } from './references-bibtex.js';
import { referencesCslJson } from './references-csl-json.js';

/** supplement/references.bib and supplement/references.json of a methods section. */
export function methodsFiles(section: MethodsSection): ExtraFile[] {
  return [
    { path: section.files.bibtex, data: referencesBibtex(section.references) },
    { path: section.files.cslJson, data: referencesCslJson(section.references) },
  ];
}
