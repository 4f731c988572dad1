// The catalogue of references a method note can cite; the methods section lists only those of methods that ran.
import type { Reference, ReferenceName } from './reference.js';

const n = (family: string, given: string): ReferenceName => ({ family, given });
const org = (name: string): ReferenceName => ({ family: name, given: '' });

const base = { container: null, volume: null, pages: null, publisher: null, doi: null, doiNote: null, url: null };

/** Ids of the catalogue, one per method or standard. */
export type ReferenceId =
  | 'menden-deuer2000'
  | 'redfield1963'
  | 'hillebrand1999'
  | 'york2004'
  | 'warton2006'
  | 'benjamini1995'
  | 'fofonoff1983'
  | 'parekh2005'
  | 'cf2022'
  | 'ioc2013'
  | 'joyce1994'
  | 'burnham2002'
  | 'wilcoxon1945'
  | 'cohen1988';

/**
 * Every reference the method notes may cite, keyed by id. DOIs are given only where checked; a work without
 * one says so in `doiNote`.
 */
export const REFERENCES: Readonly<Record<ReferenceId, Reference>> = {
  'menden-deuer2000': {
    ...base, id: 'menden-deuer2000', type: 'article-journal', authors: [n('Menden-Deuer', 'S.'), n('Lessard', 'E. J.')], year: 2000,
    title: 'Carbon to volume relationships for dinoflagellates, diatoms, and other protist plankton',
    container: 'Limnology and Oceanography', volume: '45', pages: '569–579', doi: '10.4319/lo.2000.45.3.0569',
  },
  redfield1963: {
    ...base, id: 'redfield1963', type: 'chapter', authors: [n('Redfield', 'A. C.'), n('Ketchum', 'B. H.'), n('Richards', 'F. A.')], year: 1963,
    title: 'The influence of organisms on the composition of sea-water', container: 'The Sea, vol. 2 (ed. M. N. Hill)', pages: '26–77',
    publisher: 'Interscience, New York', doiNote: 'No DOI: book chapter',
  },
  hillebrand1999: {
    ...base, id: 'hillebrand1999', type: 'article-journal',
    authors: [n('Hillebrand', 'H.'), n('Dürselen', 'C.-D.'), n('Kirschtel', 'D.'), n('Pollingher', 'U.'), n('Zohary', 'T.')], year: 1999,
    title: 'Biovolume calculation for pelagic and benthic microalgae', container: 'Journal of Phycology', volume: '35', pages: '403–424',
    doi: '10.1046/j.1529-8817.1999.3520403.x',
  },
  york2004: {
    ...base, id: 'york2004', type: 'article-journal',
    authors: [n('York', 'D.'), n('Evensen', 'N. M.'), n('López Martínez', 'M.'), n('De Basabe Delgado', 'J.')], year: 2004,
    title: 'Unified equations for the slope, intercept, and standard errors of the best straight line', container: 'American Journal of Physics',
    volume: '72', pages: '367–375', doi: '10.1119/1.1632486',
  },
  warton2006: {
    ...base, id: 'warton2006', type: 'article-journal', authors: [n('Warton', 'D. I.'), n('Wright', 'I. J.'), n('Falster', 'D. S.'), n('Westoby', 'M.')], year: 2006,
    title: 'Bivariate line-fitting methods for allometry', container: 'Biological Reviews', volume: '81', pages: '259–291', doi: '10.1017/S1464793106007007',
  },
  benjamini1995: {
    ...base, id: 'benjamini1995', type: 'article-journal', authors: [n('Benjamini', 'Y.'), n('Hochberg', 'Y.')], year: 1995,
    title: 'Controlling the false discovery rate: a practical and powerful approach to multiple testing',
    container: 'Journal of the Royal Statistical Society: Series B', volume: '57', pages: '289–300', doi: '10.1111/j.2517-6161.1995.tb02031.x',
  },
  fofonoff1983: {
    ...base, id: 'fofonoff1983', type: 'report', authors: [n('Fofonoff', 'N. P.'), n('Millard', 'R. C., Jr.')], year: 1983,
    title: 'Algorithms for computation of fundamental properties of seawater', container: 'UNESCO Technical Papers in Marine Science', volume: '44',
    publisher: 'UNESCO, Paris', doi: '10.25607/OBP-1450',
  },
  parekh2005: {
    ...base, id: 'parekh2005', type: 'article-journal', authors: [n('Parekh', 'P.'), n('Follows', 'M. J.'), n('Boyle', 'E. A.')], year: 2005,
    title: 'Decoupling of iron and phosphate in the global ocean', container: 'Global Biogeochemical Cycles', volume: '19', pages: 'GB2020',
    doi: '10.1029/2004GB002280',
  },
  cf2022: {
    ...base, id: 'cf2022', type: 'webpage', authors: [org('CF Conventions Committee')], year: 2022,
    title: 'NetCDF Climate and Forecast (CF) Metadata Conventions, version 1.10', url: 'https://cfconventions.org/', doiNote: 'DOI not given',
  },
  ioc2013: {
    ...base, id: 'ioc2013', type: 'report', authors: [org('IOC')], year: 2013,
    title: 'Ocean Data Standards, Vol. 3: Recommendation for a quality flag scheme for the exchange of oceanographic and marine meteorological data',
    container: 'IOC Manuals and Guides', volume: '54, vol. 3', publisher: 'UNESCO-IOC, Paris', doiNote: 'DOI not given',
  },
  joyce1994: {
    ...base, id: 'joyce1994', type: 'report', authors: [n('Joyce', 'T.'), n('Corry', 'C.')], year: 1994,
    title: 'Requirements for WOCE Hydrographic Programme data reporting (WOCE water-sample quality codes)', container: 'WHP Office Report',
    volume: 'WHPO 90-1, rev. 2', publisher: 'WOCE Hydrographic Programme Office, Woods Hole', doiNote: 'DOI not given',
  },
  burnham2002: {
    ...base, id: 'burnham2002', type: 'book', authors: [n('Burnham', 'K. P.'), n('Anderson', 'D. R.')], year: 2002,
    title: 'Model Selection and Multimodel Inference: A Practical Information-Theoretic Approach, 2nd edn', publisher: 'Springer, New York',
    doi: '10.1007/b97636',
  },
  wilcoxon1945: {
    ...base, id: 'wilcoxon1945', type: 'article-journal', authors: [n('Wilcoxon', 'F.')], year: 1945, title: 'Individual comparisons by ranking methods',
    container: 'Biometrics Bulletin', volume: '1', pages: '80–83', doi: '10.2307/3001968',
  },
  cohen1988: {
    ...base, id: 'cohen1988', type: 'book', authors: [n('Cohen', 'J.')], year: 1988, title: 'Statistical Power Analysis for the Behavioral Sciences, 2nd edn',
    publisher: 'Lawrence Erlbaum Associates, Hillsdale, NJ', doiNote: 'DOI not given',
  },
};

/** A reference made from a citation the user wrote in the config (e.g. a carbon factor's source): text only, no DOI. */
export function userReference(id: string, citation: string): Reference {
  return { ...base, id, type: 'report', authors: [], year: 0, title: citation, doiNote: 'DOI not given (citation from the project config)' };
}
