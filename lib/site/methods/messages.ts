// Text of the method notes that names a method or explains a choice.

/** How each carbon method obtains cellular carbon, for the quotas stage table. */
export const CARBON_METHOD_TEXT: Readonly<Record<string, string>> = {
  measured: 'measured cellular carbon',
  'biovolume-diatom': 'biovolume, Menden-Deuer & Lessard (2000) diatom relation',
  'biovolume-diatom-large': 'biovolume, Menden-Deuer & Lessard (2000) relation for diatoms > 3000 µm³',
  'biovolume-protist': 'biovolume, Menden-Deuer & Lessard (2000) relation for protists other than diatoms',
  'biovolume-factor': 'biovolume times a fixed carbon-per-volume factor',
  phosphorus: 'cellular phosphorus times the C:P ratio (Redfield et al. 1963)',
};

/** How each conversion method works, for the harmonise stage table. */
export const CONVERSION_METHOD_TEXT: Readonly<Record<string, string>> = {
  factor: 'fixed factor',
  'eos80-density': 'per litre to per kilogram with EOS-80 density from T, S and p',
  'default-density': 'per litre to per kilogram with the default density (T or S missing)',
  'molar-mass': 'mass to moles by molar mass',
  'depth-from-pressure': 'depth from pressure and latitude (Saunders & Fofonoff)',
};

/** The name of a flag scheme as the page prints it. */
export function flagSchemeText(scheme: string): string {
  if (scheme === 'ioc') return 'IOC/IODE 0–9 (IOC 2013)';
  if (scheme === 'woce') return 'WOCE water-sample codes';
  if (scheme === 'none') return 'none (every present value is good)';
  return 'project mapping';
}

/** Below-detection policy in words. */
export function detectionPolicyText(policy: 'half' | 'limit' | 'exclude'): string {
  if (policy === 'half') return 'replaced by half the detection limit (DL/2)';
  if (policy === 'limit') return 'replaced by the detection limit';
  return 'excluded';
}

/** Paragraph on why anomalies are tested on station means. */
export const STATION_AGGREGATION_TEXT =
  'Residuals of log10 Fe:C from the primary fit are averaged per station first, because cells from one station share their water and are not independent; each region × class group is then tested on its station means.';

/** Paragraph on the supplied minimum quotas (user citations, not references of a method). */
export const MIN_QUOTA_TEXT = 'Reference minimum Fe:C per class (for the luxury-uptake index) as supplied in the project config, with the citation given there.';
