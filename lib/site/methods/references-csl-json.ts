// References as CSL-JSON (supplement/references.json).
import type { Reference } from './reference.js';

/** A CSL-JSON array (one item per reference, keys in a fixed order), two-space indented with a final newline. */
export function referencesCslJson(refs: readonly Reference[]): string {
  const items = refs.map((r) => ({
    id: r.id,
    type: r.type,
    ...(r.authors.length ? { author: r.authors.map((a) => (a.given ? { family: a.family, given: a.given } : { literal: a.family })) } : {}),
    title: r.title,
    ...(r.year > 0 ? { issued: { 'date-parts': [[r.year]] } } : {}),
    ...(r.container ? { 'container-title': r.container } : {}),
    ...(r.volume ? { volume: r.volume } : {}),
    ...(r.pages ? { page: r.pages } : {}),
    ...(r.publisher ? { publisher: r.publisher } : {}),
    ...(r.doi ? { DOI: r.doi } : {}),
    ...(r.url ? { URL: r.url } : {}),
    ...(r.doiNote ? { note: r.doiNote } : {}),
  }));
  return `${JSON.stringify(items, null, 2)}\n`;
}
