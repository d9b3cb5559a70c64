import type { PlateCatalog, PlateSpec } from '../../../../../shared/engine/plates/types';

/** Test-only plate values, round numbers (not from any evaluation report): AA 120, EA 100, AE 80, EE 60. */
export const roundPlate = (width: number, length: number, steel = 1000): PlateSpec => ({
  id: `${width}x${length}`,
  gauge: 20,
  width,
  length,
  lateralValue: { aa: 120, ea: 100, ae: 80, ee: 60 },
  tensionValue: steel,
  shearValue: steel,
});

/** A one-plate test catalog. */
export const catalogOf = (plate: PlateSpec): PlateCatalog => ({
  id: 't',
  label: 'test values',
  demo: false,
  plates: [plate],
});
