// Fixed texts of the report's figures: the C:Fe caution and the default Fe* ratio.

/** Caution shown beside every implied C:Fe efficiency estimate (DESIGN "Cautions"). */
export const CARBON_PER_IRON_CAUTION =
  'Estimates of carbon per unit of iron (C:Fe efficiency) are scientific summaries of the cells measured, not a basis for adding iron to the ocean. ' +
  'Ocean fertilisation is regulated under international agreements (the London Convention and London Protocol) and national law; defer to them.';

/** Default R Fe:P (mmol mol⁻¹) for Fe* when the config gives none: Parekh, Follows & Boyle (2005), Global Biogeochem. Cycles 19, GB2020. */
export const DEFAULT_FE_STAR_RATIO = { value: 0.47, citation: 'Parekh, Follows & Boyle (2005) Global Biogeochem. Cycles 19:GB2020' };

