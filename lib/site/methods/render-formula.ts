// TeX → MathML at build time with temml; the page needs no client script.
import temml from 'temml';
import type { MethodFormula } from './methods-model.js';

/** Render TeX to display-mode MathML (temml, XML serialisation); throws on a TeX error so a bad formula fails the build. */
export function renderFormula(tex: string): string {
  return temml.renderToString(tex, { displayMode: true, xml: true, throwOnError: true });
}

/** A formula entry with its MathML rendered. */
export function formula(id: string, label: string, tex: string): MethodFormula {
  return { id, label, tex, mathml: renderFormula(tex) };
}
