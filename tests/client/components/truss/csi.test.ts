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

describe('the CSI ramp reads in order of severity', () => {
  it('gets darker with every band (relative luminance, WCAG 2.x definition)', async () => {
    const { default: config } = await import('../../../../tailwind.config');
    const ramp = (config.theme!.colors as Record<string, Record<string, string>>).csi;
    const luminance = (hex: string) => {
      const [r, g, b] = [1, 3, 5].map((i) => {
        const c = parseInt(hex.slice(i, i + 2), 16) / 255;
        return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
      });
      return 0.2126 * r + 0.7152 * g + 0.0722 * b;
    };
    const token = (cls: string) => cls.replace(/^(stroke|fill)-csi-/, '');
    const steps = CSI_BANDS.map((b) => luminance(ramp[token(b.stroke)]));
    for (let i = 1; i < steps.length; i++) expect(steps[i]).toBeLessThan(steps[i - 1]);
  });
});
