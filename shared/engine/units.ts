/**
 * Branded unit types. The engine computes in SI (mm, N, MPa, N/mm); imperial values exist only
 * at the edges (forms, tables, PDFs, the CLI). A brand makes the compiler refuse to mix them.
 */
declare const unit: unique symbol;
export type Unit<U extends string> = number & { readonly [unit]: U };

export type Mm = Unit<'mm'>;
export type Inch = Unit<'in'>;
export type Newton = Unit<'N'>;
export type Lbf = Unit<'lbf'>;
export type MPa = Unit<'MPa'>;
export type Psi = Unit<'psi'>;
/** Area load in kPa (kN/m²). */
export type KPa = Unit<'kPa'>;
/** Area load in lbf/ft². */
export type Psf = Unit<'psf'>;
/** Line load in N/mm (= kN/m). */
export type NPerMm = Unit<'N/mm'>;
export type Degrees = Unit<'deg'>;
export type Radians = Unit<'rad'>;

/** Relative tolerance used everywhere the engine compares floating-point results. */
export const TOLERANCE = 1e-9;

// Exact by definition: 1 in = 25.4 mm; 1 lbf = 4.4482216152605 N; 1 psi = 6894.757293168 Pa.
export const MM_PER_INCH = 25.4;
export const N_PER_LBF = 4.4482216152605;
export const MPA_PER_PSI = 0.006894757293168;
export const KPA_PER_PSF = 0.04788025898033584;

export const mm = (v: number) => v as Mm;
export const inch = (v: number) => v as Inch;
export const newton = (v: number) => v as Newton;
export const lbf = (v: number) => v as Lbf;
export const mpa = (v: number) => v as MPa;
export const psi = (v: number) => v as Psi;
export const kpa = (v: number) => v as KPa;
export const psf = (v: number) => v as Psf;

export const inchToMm = (v: Inch) => (v * MM_PER_INCH) as Mm;
export const mmToInch = (v: Mm) => (v / MM_PER_INCH) as Inch;
export const lbfToN = (v: Lbf) => (v * N_PER_LBF) as Newton;
export const nToLbf = (v: Newton) => (v / N_PER_LBF) as Lbf;
export const psiToMpa = (v: Psi) => (v * MPA_PER_PSI) as MPa;
export const mpaToPsi = (v: MPa) => (v / MPA_PER_PSI) as Psi;
export const psfToKpa = (v: Psf) => (v * KPA_PER_PSF) as KPa;
export const kpaToPsf = (v: KPa) => (v / KPA_PER_PSF) as Psf;
export const degToRad = (v: Degrees) => ((v * Math.PI) / 180) as Radians;
export const radToDeg = (v: Radians) => ((v * 180) / Math.PI) as Degrees;

/** Roof pitch as rise per 12 of run → slope angle. */
export const pitchToRadians = (risePer12: number) => Math.atan(risePer12 / 12) as Radians;
