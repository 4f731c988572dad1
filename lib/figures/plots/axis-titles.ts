// Axis titles with canonical units, shared by every plot builder.

/** Fe:C axis title (µmol Fe per mol C). */
export const FE_C_TITLE = 'Fe:C (µmol mol⁻¹)';
/** Dissolved iron axis title (canonical nmol kg⁻¹). */
export const DFE_TITLE = 'dissolved Fe (nmol kg⁻¹)';
/** Nitrate axis title (canonical µmol kg⁻¹). */
export const NITRATE_TITLE = 'nitrate (µmol kg⁻¹)';
/** Depth axis title (m, positive down). */
export const DEPTH_TITLE = 'depth (m)';
