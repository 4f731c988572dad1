// References as BibTeX (supplement/references.bib).
import type { Reference } from './reference.js';

const ENTRY_TYPE: Record<Reference['type'], string> = { 'article-journal': 'article', book: 'book', chapter: 'incollection', report: 'techreport', webpage: 'misc' };

/** Escape BibTeX specials in a field value and protect capitals with braces around the whole value. */
function field(name: string, value: string): string {
  const text = value.replace(/[\\{}]/g, '').replace(/([&%$#_])/g, '\\$1');
  return `  ${name} = {${text}}`;
}

/** BibTeX entries, one per reference, keys = reference ids, in the given order; DOIs without resolver prefix. */
export function referencesBibtex(refs: readonly Reference[]): string {
  return refs
    .map((r) => {
      const fields: string[] = [];
      if (r.authors.length) fields.push(field('author', r.authors.map((a) => (a.given ? `${a.family}, ${a.given}` : `{${a.family}}`)).join(' and ').replace(/[{}]/g, '')));
      fields.push(field('title', r.title));
      if (r.year > 0) fields.push(field('year', String(r.year)));
      const container = r.type === 'article-journal' ? 'journal' : r.type === 'chapter' ? 'booktitle' : r.type === 'report' ? 'institution' : null;
      if (container && r.container) fields.push(field(container, r.container));
      if (r.volume) fields.push(field(r.type === 'report' ? 'number' : 'volume', r.volume));
      if (r.pages) fields.push(field('pages', r.pages.replace('–', '--')));
      if (r.publisher) fields.push(field('publisher', r.publisher));
      if (r.doi) fields.push(field('doi', r.doi));
      if (r.url) fields.push(field('url', r.url));
      if (r.doiNote) fields.push(field('note', r.doiNote));
      return `@${ENTRY_TYPE[r.type]}{${r.id},\n${fields.join(',\n')}\n}\n`;
    })
    .join('\n');
}

