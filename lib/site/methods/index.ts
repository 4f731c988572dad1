// Public names of the method notes.
export { methodsSection, REFERENCE_FILES } from './methods-section.js';
export { methodsFiles } from './methods-files.js';
export { referencesBibtex } from './references-bibtex.js';
export { referencesCslJson } from './references-csl-json.js';
export { REFERENCES, userReference, type ReferenceId } from './references.js';
export { doiUrl, formatAuthors, formatReference, type Reference, type ReferenceName } from './reference.js';
export { renderFormula } from './render-formula.js';
export type { MethodsSection, MethodStage, MethodParameter, MethodFormula, MethodTable } from './methods-model.js';
