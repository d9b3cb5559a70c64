import { describe, expect, it } from 'vitest';
import {
  bandWidthPx,
  drawingBounds,
  fitTransform,
  labelOffset,
  lumberDepthMm,
  overhangTips,
  toScreen,
} from '../../../../src/components/truss/geometry';
import {
  chainDimensions,
  drawingTitle,
  pitchSymbol,
} from '../../../../src/components/truss/dimensions';
import { drawingFromProfile } from '../../../../src/components/truss/model';
import { generateProfile } from '../../../../shared/engine/profiles';

const FT = 304.8; // exact: 12 × 25.4 mm
const fink = () =>
  drawingFromProfile(
    generateProfile({
      kind: 'fink',
      span: 28 * FT,
      pitch: 6,
      heelHeight: 0,
      overhangLeft: FT,
      overhangRight: FT,
    }),
  );

describe('drawing geometry', () => {
  it('continues the top chord at its slope beyond each heel (6/12: 6 in down per foot)', () => {
    const tips = overhangTips(fink());
    expect(tips).toHaveLength(2);
    const left = tips.find((t) => t.side === 'left')!;
    expect(left.tip.x).toBeWithin(-FT, { abs: 1e-9 });
    expect(left.tip.y).toBeWithin(-FT / 2, { abs: 1e-6 });
    const b = drawingBounds(fink());
    expect(b.minX).toBeWithin(-FT, { abs: 1e-9 });
    expect(b.maxX).toBeWithin(29 * FT, { abs: 1e-9 });
    // Rise of a 28 ft 6/12 truss with a pointed heel: 14 ft × 6/12 = 7 ft.
    expect(b.maxY).toBeWithin(7 * FT, { rel: 1e-9 });
  });

  it('fits with one scale for both axes, inside the margins, y flipped', () => {
    const bounds = { minX: 0, maxX: 1000, minY: 0, maxY: 100 };
    const t = fitTransform(bounds, 600, 300, { top: 10, right: 10, bottom: 10, left: 10 });
    expect(t.scale).toBeWithin(0.58, { rel: 1e-12 });
    const a = toScreen(t, { x: 0, y: 0 });
    const c = toScreen(t, { x: 1000, y: 100 });
    expect(a.x).toBeWithin(10, { abs: 1e-9 });
    expect(c.x).toBeWithin(590, { abs: 1e-9 });
    expect(c.y).toBeLessThan(a.y);
    // Centred vertically: equal room above and below.
    expect(c.y - 10).toBeWithin(290 - a.y, { abs: 1e-9 });
  });

  it('draws bands at the dressed lumber width, kept readable (NDS 2018 Supplement Table 1A)', () => {
    expect(lumberDepthMm('2x4 SPF-1/2')).toBeWithin(3.5 * 25.4, { abs: 1e-9 });
    expect(lumberDepthMm('2x6 SP-2')).toBeWithin(5.5 * 25.4, { abs: 1e-9 });
    expect(bandWidthPx('2x4 SPF-1/2', 0.05)).toBeWithin(4.445, { abs: 1e-9 });
    expect(bandWidthPx('2x4 SPF-1/2', 0.001)).toBe(3);
    expect(bandWidthPx('2x12 DFL-1', 1)).toBe(16);
  });

  it('points joint labels away from the middle', () => {
    const o = labelOffset({ x: 0, y: 100 }, { x: 0, y: 0 }, 15);
    expect(o).toEqual({ x: 0, y: 15 });
  });
});

describe('dimensions', () => {
  it('chains overhang, span, overhang in feet-inches for an imperial plant', () => {
    expect(chainDimensions(fink(), 'imperial').map((s) => s.label)).toEqual([
      `1'-0"`,
      `28'-0"`,
      `1'-0"`,
    ]);
    expect(chainDimensions(fink(), 'metric').map((s) => s.label)).toEqual([
      '305 mm',
      '8534 mm',
      '305 mm',
    ]);
  });

  it('shows the pitch as rise over 12 and names the drawing without field words', () => {
    expect(pitchSymbol(fink())).toEqual({ rise: '6', run: '12' });
    const title = drawingTitle('Fink (W)', fink(), 'imperial');
    expect(title).toBe(`Fink (W) truss drawing, 28'-0" out to out, 6/12`);
    expect(title).not.toMatch(/span|pitch|mark/i);
  });
});

describe('mono overhangs', () => {
  it('dimensions only the overhangs it draws', () => {
    const mono = drawingFromProfile(
      generateProfile({
        kind: 'mono',
        span: 16 * FT,
        pitch: 4,
        heelHeight: 0,
        overhangLeft: FT,
        overhangRight: FT,
      }),
    );
    const drawn = overhangTips(mono).map((t) => t.side);
    const chain = chainDimensions(mono, 'imperial').map((s) => s.key);
    expect(chain).toContain('span');
    expect(chain.includes('overhangRight')).toBe(drawn.includes('right'));
    expect(chain.includes('overhangLeft')).toBe(drawn.includes('left'));
  });
});
