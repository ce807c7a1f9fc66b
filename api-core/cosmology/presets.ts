import type { CosmologyParameters } from "./parameters";

export interface Preset {
  slug: string;
  version: 1;
  title: string;
  source: string;
  parameters: CosmologyParameters;
}

/**
 * Published parameter sets. Each number is quoted beside its source; all table values below were
 * entered from memory of the papers (no copy of the tables was at hand) and should be re-checked
 * against the cited table before a release.
 */
export const PRESETS: Record<string, Preset> = {
  planck18: {
    slug: "planck18",
    version: 1,
    title: "Planck 2018 (TT,TE,EE+lowE+lensing+BAO)",
    source:
      "Planck Collaboration (2020), Planck 2018 results VI, A&A 641, A6, Table 2, column TT,TE,EE+lowE+lensing+BAO " +
      "(H0 = 67.66, Omega_m = 0.3111); flat; Tcmb = 2.7255 K (Fixsen 2009, ApJ 707, 916); N_eff = 3.046 with one " +
      "massive species of 0.06 eV (the paper's baseline).",
    parameters: {
      h0: 67.66, // Table 2, last column (from memory)
      omegaM: 0.3111, // Table 2, last column (from memory)
      omegaDE: null, // flat baseline
      tcmb: 2.7255, // Fixsen (2009)
      nEff: 3.046, // Planck 2018 baseline
      neutrinoMasses: [0.06], // Planck 2018 baseline: one massive eigenstate, 0.06 eV
      w0: -1,
      wa: 0,
    },
  },
  planck15: {
    slug: "planck15",
    version: 1,
    title: "Planck 2015 (TT,TE,EE+lowP+lensing+ext)",
    source:
      "Planck Collaboration (2016), Planck 2015 results XIII, A&A 594, A13, Table 4, column TT,TE,EE+lowP+lensing+ext " +
      "(H0 = 67.74, Omega_m = 0.3089); flat; Tcmb = 2.7255 K (Fixsen 2009); N_eff = 3.046 with one massive species of 0.06 eV.",
    parameters: {
      h0: 67.74, // Table 4, last column (from memory)
      omegaM: 0.3089, // Table 4, last column (from memory)
      omegaDE: null,
      tcmb: 2.7255,
      nEff: 3.046,
      neutrinoMasses: [0.06],
      w0: -1,
      wa: 0,
    },
  },
  wmap9: {
    slug: "wmap9",
    version: 1,
    title: "WMAP nine-year (WMAP+eCMB+BAO+H0)",
    source:
      "Hinshaw et al. (2013), ApJS 208, 19, Table 4, column WMAP+eCMB+BAO+H0 (H0 = 69.32, Omega_m = 0.2865); flat; " +
      "Tcmb = 2.7255 K (Fixsen 2009); N_eff = 3.046, massless neutrinos.",
    parameters: {
      h0: 69.32, // Table 4 (from memory; Omega_m h^2 = 0.1377 recalled from the same column agrees: 0.1377 / 0.6932^2 = 0.2866)
      omegaM: 0.2865, // Table 4 (from memory)
      omegaDE: null,
      tcmb: 2.7255,
      nEff: 3.046,
      neutrinoMasses: [],
      w0: -1,
      wa: 0,
    },
  },
  textbook: {
    slug: "textbook",
    version: 1,
    title: "Textbook flat ΛCDM (H0 = 70, Ωm = 0.3, ΩΛ = 0.7, no radiation)",
    source: "Common practice in teaching and quick estimates; not a fit to data. Radiation switched off (tcmb = 0).",
    parameters: {
      h0: 70,
      omegaM: 0.3,
      omegaDE: null, // flat: omegaDE = 1 − 0.3 = 0.7 exactly as intended, no rounding residue in omegaK
      tcmb: 0,
      nEff: 3.046,
      neutrinoMasses: [],
      w0: -1,
      wa: 0,
    },
  },
};
