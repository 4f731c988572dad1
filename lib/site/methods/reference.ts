// The shape of one bibliographic reference of the method notes.

/** One author or editor, family name first. */
export interface ReferenceName {
  /** Family name. */
  family: string;
  /** Given names or initials. */
  given: string;
}

/** One entry of the references list; `doi` is null only together with `doiNote` saying why. */
export interface Reference {
  /** Stable id, also the BibTeX key and CSL-JSON id (e.g. "menden-deuer2000"). */
  id: string;
  /** Kind of work, as CSL names it. */
  type: 'article-journal' | 'book' | 'chapter' | 'report' | 'webpage';
  /** Authors in order; an organisation is one name with an empty `given`. */
  authors: ReferenceName[];
  /** Year of publication. */
  year: number;
  /** Title of the work. */
  title: string;
  /** Journal, book or series the work appears in, or null. */
  container: string | null;
  /** Volume or report number, or null. */
  volume: string | null;
  /** Page range or article number, or null. */
  pages: string | null;
  /** Publisher or issuing body, or null. */
  publisher: string | null;
  /** DOI without the resolver prefix, or null when the work has none or none is given. */
  doi: string | null;
  /** Why there is no DOI ("No DOI: book chapter", "DOI not given"); null when `doi` is set. */
  doiNote: string | null;
  /** Web address for works without a DOI, or null. */
  url: string | null;
}

/** The resolver link of a DOI: plain `https://doi.org/…`. */
export function doiUrl(doi: string): string {
  return `https://doi.org/${doi}`;
}

/** Author list as printed on the page: "Family, G., Family, G. & Family, G.". */
export function formatAuthors(authors: readonly ReferenceName[]): string {
  const names = authors.map((a) => (a.given ? `${a.family}, ${a.given}` : a.family));
  return names.length <= 1 ? names.join('') : `${names.slice(0, -1).join(', ')} & ${names[names.length - 1]}`;
}

/** One-line citation without the DOI: authors (year) title. container volume, pages. publisher. */
export function formatReference(ref: Reference): string {
  const where = [ref.container, ref.volume, ref.pages].filter((x): x is string => x !== null).join(', ');
  const head = ref.authors.length > 0 ? `${formatAuthors(ref.authors)} (${ref.year}) ${ref.title}.` : `${ref.title}.`;
  return [head, where ? `${where}.` : '', ref.publisher ? `${ref.publisher}.` : ''].filter(Boolean).join(' ');
}
