import { describe, expect, it } from 'vitest';
import { CSI_BANDS, csiBand, formatCsi } from '../../../../src/components/truss/csi';

describe('CSI colour bands', () => {
  it('puts each index in its band, inclusive upper bounds (common practice: CSI ≤ 1.00 passes)', () => {
    expect(csiBand(0).id).toBe('low');
    expect(csiBand(0.5).id).toBe('low');
    expect(csiBand(0.51).id).toBe('moderate');
    expect(csiBand(0.75).id).toBe('moderate');
    expect(csiBand(0.9).id).toBe('high');
    expect(csiBand(1).id).toBe('near');
    expect(csiBand(1.01).id).toBe('fails');
  });

  it('fails above 1.00 exactly, and the text never reads as passing when it fails', () => {
    expect(csiBand(1.004).fails).toBe(true);
    expect(formatCsi(1.004)).toBe('> 1.00');
    expect(formatCsi(1)).toBe('1.00');
    expect(formatCsi(0.876)).toBe('0.88');
  });

  it('never shows a missing result as safe', () => {
    expect(csiBand(Number.NaN).fails).toBe(true);
    expect(formatCsi(undefined)).toBe('—');
  });

  it('has five bands with distinct colours, only the last failing', () => {
    expect(CSI_BANDS).toHaveLength(5);
    expect(new Set(CSI_BANDS.map((b) => b.stroke)).size).toBe(5);
    expect(CSI_BANDS.filter((b) => b.fails).map((b) => b.id)).toEqual(['fails']);
  });
});
