import { describe, expect, it } from 'vitest';
import {
  carbonFromBiovolume,
  carbonFromFactor,
  DEFAULT_PICOCYANOBACTERIA_FACTOR,
  picogramsCarbonToMol,
} from '../../lib/quotas/index.js';

// Menden-Deuer & Lessard (2000) Limnol. Oceanogr. 45:569; pg C per cell, recomputed values as tabulated for this project.
const MDL = [
  { v: 10, diatomPower: 1.8637707333559197, diatomLog: 1.8620871366628677, otherPower: 1.8769545272584116, otherLog: 1.8793168168032681 },
  { v: 100, diatomPower: 12.061254675396052, diatomLog: 12.050359403717978, otherPower: 16.30999211757337, otherLog: 16.33051947894334 },
  { v: 1000, diatomPower: 78.0535189984563, diatomLog: 77.9830110523259, otherPower: 141.7273775214275, otherLog: 141.90575216890915 },
  { v: 10000, diatomPower: 505.1175845304274, diatomLog: 504.6612975635286, otherPower: 1231.554828126414, otherLog: 1233.1048332289083 },
];

describe('carbonFromBiovolume(v, relation)', () => {
  for (const row of MDL) {
    it(`gives the log-form diatom and protist carbon at V = ${row.v} µm³ (Menden-Deuer & Lessard 2000, Table 4)`, () => {
      expect(carbonFromBiovolume(row.v, 'diatom')).toBeCloseTo(row.diatomLog, 10);
      expect(carbonFromBiovolume(row.v, 'protist')).toBeCloseTo(row.otherLog, 10);
    });
    it(`gives the rounded power-form carbon at V = ${row.v} µm³ (Menden-Deuer & Lessard 2000)`, () => {
      expect(carbonFromBiovolume(row.v, 'diatom', { form: 'power' })).toBeCloseTo(row.diatomPower, 10);
      expect(carbonFromBiovolume(row.v, 'protist', { form: 'power' })).toBeCloseTo(row.otherPower, 10);
    });
  }

  it('uses the large-diatom relation 0.117·V^0.881 above 3000 µm³ only when enabled', () => {
    // 0.117·10000^0.881 = 0.117·10^3.524 = 391.008… pg (Menden-Deuer & Lessard 2000, diatoms > 3000 µm³).
    expect(carbonFromBiovolume(10000, 'diatom', { largeDiatoms: true })).toBeCloseTo(391.00819683055374, 9);
    // Same paper's general diatom fit when the option is off.
    expect(carbonFromBiovolume(10000, 'diatom')).toBeCloseTo(504.6612975635286, 10);
    // Exactly 3000 µm³ is not "> 3000": the general fit, 10^(−0.541 + 0.811·log10 3000) = 190.08… pg.
    expect(carbonFromBiovolume(3000, 'diatom', { largeDiatoms: true })).toBeCloseTo(190.0839015993676, 9);
    // Protists never take the diatom-only relation.
    expect(carbonFromBiovolume(10000, 'protist', { largeDiatoms: true })).toBeCloseTo(1233.1048332289083, 9);
  });

  it('returns NaN for zero, negative and missing volumes', () => {
    expect(carbonFromBiovolume(0, 'diatom')).toBeNaN();
    expect(carbonFromBiovolume(-5, 'protist')).toBeNaN();
    expect(carbonFromBiovolume(Number.NaN, 'diatom')).toBeNaN();
  });
});

describe('carbonFromFactor(v, factor)', () => {
  it('multiplies fg C µm⁻³ by volume and gives pg', () => {
    // 350 fg C µm⁻³ × 1 µm³ = 350 fg = 0.35 pg (arithmetic on the default factor).
    expect(DEFAULT_PICOCYANOBACTERIA_FACTOR.fgCPerUm3).toBe(350);
    expect(carbonFromFactor(1, DEFAULT_PICOCYANOBACTERIA_FACTOR)).toBeCloseTo(0.35, 12);
    expect(carbonFromFactor(2, { fgCPerUm3: 200, citation: 'test' })).toBeCloseTo(0.4, 12);
  });
});

describe('picogramsCarbonToMol(pg)', () => {
  it('divides by the molar mass of carbon', () => {
    // 12.011 pg C = 1e-12 mol C (IUPAC conventional atomic weight of carbon 12.011).
    expect(picogramsCarbonToMol(12.011)).toBeCloseTo(1e-12, 24);
  });
});
