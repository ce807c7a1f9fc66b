import {
  BOLTZMANN,
  ELECTRONVOLT,
  GRAVITATIONAL_CONSTANT,
  MEGAPARSEC,
  SPEED_OF_LIGHT,
  SPEED_OF_LIGHT_KM_S,
  STEFAN_BOLTZMANN,
  GIGAYEAR,
} from "./constants";
import { CosmologyError } from "./errors";
import { fermiDiracRatio } from "./neutrinos";
import { NEUTRINO_SPECIES, type CosmologyParameters } from "./parameters";

/** Largest redshift the engine answers for (u = ln(1+z) ≤ ln(1e10 + 1) ≈ 23.03). */
export const MAX_REDSHIFT = 1e10;

/** Smallest E(z)² accepted anywhere on z ≥ 0: below it the model is too close to a loitering/bounce point. */
const MIN_HUBBLE_SQUARED = 1e-9;

/**
 * The background model: today's density of every component and E(z)² = H(z)²/H0², the only thing
 * that differs between models (Hogg 1999, eq. 14, extended by massive neutrinos and CPL dark energy):
 *
 *   E² = Ω_r (1+z)⁴ + Ω_c (1+z)³ + Σ_i Ω_ν1 (1+z)⁴ F(y_i)/F(0) + Ω_k (1+z)² + Ω_DE f_DE(z)
 *
 * with f_DE = (1+z)^{3(1+w0+wa)} exp(−3 wa z/(1+z)) for w(a) = w0 + wa(1 − a) (Linder 2003, eq. 5).
 * Ω_r (`omegaRadiation`) holds photons and massless neutrinos; massive neutrinos are counted as
 * matter at every z (also while still relativistic), so omegaM(z) = [Ω_c(1+z)³ + ρ_ν,massive(z)]/E².
 */
export class Background {
  readonly hubbleDistance: number; // c/H0, Mpc
  readonly hubbleTime: number; // 1/H0, Gyr
  readonly criticalDensity: number; // kg/m^3 today
  readonly omegaGamma: number;
  /** Relativistic-limit density of one neutrino species: (nEff/3)(7/8)(4/11)^{4/3} Ω_γ. */
  readonly omegaNuPerSpecies: number;
  /** Photons + massless neutrinos today. */
  readonly omegaRadiation: number;
  readonly omegaNuMassive: number;
  readonly omegaColdMatter: number;
  readonly omegaDE: number;
  readonly omegaK: number;
  /** y_i today = m_i c² / (k_B T_ν0), one per massive species. */
  readonly massiveNeutrinoY: Float64Array;
  /** 3(1 + w0 + wa): the dark-energy density grows as (1+z)^this at high z. */
  readonly darkEnergyExponent: number;
  readonly isCosmologicalConstant: boolean;
  private readonly wa: number;

  constructor(p: CosmologyParameters) {
    const hubbleRate = (p.h0 * 1e3) / MEGAPARSEC; // s^-1
    this.hubbleDistance = SPEED_OF_LIGHT_KM_S / p.h0;
    this.hubbleTime = 1 / hubbleRate / GIGAYEAR;
    this.criticalDensity = (3 * hubbleRate * hubbleRate) / (8 * Math.PI * GRAVITATIONAL_CONSTANT);

    // ρ_γ = 4σT⁴/c³ (Stefan–Boltzmann; DESIGN.md §2); tcmb = 0 removes every relativistic species.
    const photonDensity = (4 * STEFAN_BOLTZMANN * p.tcmb ** 4) / SPEED_OF_LIGHT ** 3;
    this.omegaGamma = photonDensity / this.criticalDensity;
    this.omegaNuPerSpecies = (p.nEff / NEUTRINO_SPECIES) * (7 / 8) * (4 / 11) ** (4 / 3) * this.omegaGamma;

    const radiationOn = p.tcmb > 0;
    const neutrinoTemperature = (4 / 11) ** (1 / 3) * p.tcmb; // T_ν0 (instantaneous decoupling)
    this.massiveNeutrinoY = radiationOn
      ? Float64Array.from(p.neutrinoMasses, (mass) => (mass * ELECTRONVOLT) / (BOLTZMANN * neutrinoTemperature))
      : new Float64Array(0);
    const masslessSpecies = radiationOn ? NEUTRINO_SPECIES - p.neutrinoMasses.length : NEUTRINO_SPECIES;
    this.omegaRadiation = this.omegaGamma + masslessSpecies * this.omegaNuPerSpecies;

    let massiveToday = 0;
    for (const y of this.massiveNeutrinoY) massiveToday += this.omegaNuPerSpecies * fermiDiracRatio(y);
    this.omegaNuMassive = massiveToday;
    this.omegaColdMatter = p.omegaM - massiveToday;
    if (this.omegaColdMatter < 0) {
      throw new CosmologyError(
        "neutrinoMasses",
        `Massive neutrinos alone give Ω_ν = ${massiveToday.toPrecision(6)} today, more than omegaM = ${p.omegaM}; ` +
          "omegaM includes the neutrinos, so lower the masses or raise omegaM.",
      );
    }

    if (p.omegaDE === null) {
      this.omegaDE = 1 - p.omegaM - this.omegaRadiation;
      this.omegaK = 0;
      if (this.omegaDE < 0) {
        throw new CosmologyError(
          "omegaM",
          `A flat universe needs omegaM + radiation ≤ 1 (here ${(p.omegaM + this.omegaRadiation).toPrecision(8)}); ` +
            "lower omegaM or give omegaDE for a curved universe.",
        );
      }
    } else {
      this.omegaDE = p.omegaDE;
      const total = p.omegaM + this.omegaRadiation + p.omegaDE;
      const omegaK = 1 - total;
      // Rounding of 1 − 0.3 − 0.7 leaves ~1e-17; call that flat rather than a universe of radius 1e8 Hubble lengths.
      this.omegaK = Math.abs(omegaK) <= 8 * Number.EPSILON * Math.max(1, total) ? 0 : omegaK;
    }

    this.wa = p.wa;
    this.darkEnergyExponent = 3 * (1 + p.w0 + p.wa);
    this.isCosmologicalConstant = p.w0 === -1 && p.wa === 0;
    this.checkBigBang();
  }

  /** Dark-energy density relative to today at 1+z = e^u (Linder 2003, eq. 5). */
  darkEnergyFactor(u: number): number {
    if (this.isCosmologicalConstant) return 1;
    return Math.exp(this.darkEnergyExponent * u - 3 * this.wa * -Math.expm1(-u));
  }

  /** Σ over massive species of ρ_ν,i(z)/ρ_crit,0, at 1+z = e^u. */
  massiveNeutrinoDensity(onePlusZ: number): number {
    let sum = 0;
    const relativistic = this.omegaNuPerSpecies * onePlusZ ** 4;
    for (let i = 0; i < this.massiveNeutrinoY.length; i++) sum += relativistic * fermiDiracRatio(this.massiveNeutrinoY[i] / onePlusZ);
    return sum;
  }

  /** Matter (cold + massive neutrinos) density relative to ρ_crit,0 at 1+z. */
  matterDensity(onePlusZ: number): number {
    return this.omegaColdMatter * onePlusZ ** 3 + this.massiveNeutrinoDensity(onePlusZ);
  }

  /** E(z)² at u = ln(1+z); onePlusZ = e^u passed in so callers keep 1+z exact. */
  hubbleSquared(u: number, onePlusZ: number): number {
    const square = onePlusZ * onePlusZ;
    return (
      this.omegaRadiation * square * square +
      this.matterDensity(onePlusZ) +
      this.omegaK * square +
      this.omegaDE * this.darkEnergyFactor(u)
    );
  }

  /**
   * True when the age integral ∫ dz/((1+z)E) diverges: nothing grows toward the past faster than
   * a constant (e.g. de Sitter). Such models have no big bang and no finite age.
   */
  get isEternal(): boolean {
    const growing =
      this.omegaRadiation > 0 ||
      this.omegaColdMatter > 0 ||
      this.omegaNuMassive > 0 ||
      this.omegaK > 0 ||
      (this.omegaDE > 0 && this.darkEnergyExponent > 0);
    return !growing;
  }

  /**
   * Reject a model whose E² reaches zero at some z ≥ 0 (bounce or loitering: no big bang).
   * Every term but curvature is ≥ 0, so only Ω_k < 0 can fail. We scan P(u) = E²/(1+z)² on a fine
   * grid in u up to 60 (1+z ≈ 1e26), refine the lowest point, and check the u → ∞ limit analytically:
   * beyond the grid every term is a pure power of (1+z).
   */
  private checkBigBang(): void {
    if (this.omegaK >= 0) return;
    const failure = () =>
      new CosmologyError(
        "omegaDE",
        `This closed universe (omegaK = ${this.omegaK.toPrecision(6)}) has no big bang: H(z)² reaches zero at some z > 0 ` +
          "(a bounce or loitering point). Lower omegaDE, raise omegaM, or give a flat model.",
      );
    const scaled = (u: number) => {
      const onePlusZ = Math.exp(u);
      return this.hubbleSquared(u, onePlusZ) / (onePlusZ * onePlusZ);
    };
    const step = 1 / 256;
    const top = 60;
    let lowest = Infinity;
    let lowestAt = 0;
    for (let u = 0; u <= top; u += step) {
      const value = scaled(u);
      if (value < lowest) {
        lowest = value;
        lowestAt = u;
      }
    }
    // Golden-section refinement around the grid minimum catches a dip narrower than the grid step.
    let left = Math.max(0, lowestAt - step);
    let right = Math.min(top, lowestAt + step);
    const ratio = (Math.sqrt(5) - 1) / 2;
    for (let i = 0; i < 80; i++) {
      const inner1 = right - ratio * (right - left);
      const inner2 = left + ratio * (right - left);
      if (scaled(inner1) < scaled(inner2)) right = inner2;
      else left = inner1;
    }
    const refinedAt = (left + right) / 2;
    lowest = Math.min(lowest, scaled(refinedAt));
    lowestAt = refinedAt;
    if (lowest * Math.exp(2 * lowestAt) <= MIN_HUBBLE_SQUARED) throw failure();

    const growsAtEarlyTimes =
      this.omegaRadiation > 0 || this.omegaColdMatter > 0 || this.omegaNuMassive > 0 || (this.omegaDE > 0 && this.darkEnergyExponent > 2);
    if (!growsAtEarlyTimes) {
      // Only dark energy with (1+z)^q, q ≤ 2, against −|Ω_k|(1+z)²: E² → −∞ or → a constant ≤ 0.
      const limit = this.darkEnergyExponent === 2 ? this.omegaDE * Math.exp(-3 * this.wa) + this.omegaK : -1;
      if (limit <= 0) throw failure();
    }
  }
}
