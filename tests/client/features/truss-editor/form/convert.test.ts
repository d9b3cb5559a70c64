import { describe, expect, it } from 'vitest';
import {
  designToFormValues,
  fieldForPath,
  formToRequest,
  serverFieldErrors,
} from '../../../../../src/features/truss-editor/form/convert';
import { newTrussFormValues } from '../../../../../src/features/truss-editor/form/values';

// Typical loads, DESIGN.md §1 (common practice): TCLL 20, TCDL 10, BCLL 0, BCDL 10 psf.
const LOADS = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 };
// The same loads in kPa (1 psf = 0.04788 kPa, exact by definition of lbf and ft), rounded.
const METRIC_LOADS = { tcll: 0.96, tcdl: 0.48, bcll: 0, bcdl: 0.48 };
const imperial = () => ({ ...newTrussFormValues('imperial', LOADS), mark: 'T1' });

describe('truss form → design request', () => {
  it('reads feet-inches-sixteenths into inches for the schema (1 ft = 12 in exactly)', () => {
    const r = formToRequest({ ...imperial(), span: `28'-6 1/2"` }, 'imperial');
    if (!r.request || !r.input) throw new Error('expected a valid form');
    expect(r.request.design.span).toBeWithin(342.5, { abs: 1e-9 });
    expect(r.request.design.overhang).toEqual({ left: 12, right: 12 });
    expect(r.request.design.pitch).toBe(6);
    expect(r.input.spacing).toBe(24);
    expect(r.request).toMatchObject({ mark: 'T1', quantity: 1, plies: 1 });
  });

  it('reads millimetres for a metric plant', () => {
    const r = formToRequest(
      { ...newTrussFormValues('metric', METRIC_LOADS), mark: 'A1' },
      'metric',
    );
    expect(r.request?.design).toMatchObject({ units: 'metric', span: 8500 });
  });

  it('keeps the parser message for text it cannot read', () => {
    const r = formToRequest({ ...imperial(), span: 'twenty' }, 'imperial');
    expect(r.request).toBeNull();
    expect(r.input).toBeNull();
    expect(r.errors.span).toMatch(/Can't read "twenty" as a length/);
  });

  it('shows the schema range message in the user units', () => {
    const r = formToRequest({ ...imperial(), span: `90'-0"` }, 'imperial');
    expect(r.input).toBeNull();
    expect(r.errors.span).toBe('Span must be between 4 ft and 80 ft');
  });

  it('asks for a bottom-chord pitch below the top pitch on a scissor', () => {
    const r = formToRequest({ ...imperial(), profile: 'scissor', bottomPitch: '7/12' }, 'imperial');
    expect(r.input).toBeNull();
    expect(r.errors.bottomPitch).toMatch(/below the top pitch/);
  });

  it('flags a bad mark but still gives the design, so the drawing keeps up', () => {
    const r = formToRequest({ ...imperial(), mark: '' }, 'imperial');
    expect(r.request).toBeNull();
    expect(r.errors.mark).toBe('Enter a truss mark, e.g. T1');
    expect(r.input?.span).toBe(336);
  });

  it('sends snow only when a ground snow load is given, and lumber only when picked', () => {
    const r = formToRequest(
      { ...imperial(), snowPg: '30', snowCt: '1.1', lumberTop: '2x6 SP-2', webBraces: 'bk, cj' },
      'imperial',
    );
    if (!r.request) throw new Error('expected a valid form');
    expect(r.request.design.loads.snow).toEqual({ pg: 30, ct: 1.1, slippery: false });
    expect(r.request.design.lumber).toEqual({ topChord: '2x6 SP-2' });
    expect(r.request.design.webBraces).toEqual(['BK', 'CJ']);
  });
});

describe('stored design → form text', () => {
  it('round-trips a request through the form', () => {
    const first = formToRequest(
      { ...imperial(), span: `28'-6 1/2"`, heelHeight: '5 1/2' },
      'imperial',
    );
    if (!first.request) throw new Error('expected a valid form');
    const values = designToFormValues(first.request.design, first.request, imperial());
    expect(values.span).toBe(`28'-6 1/2"`);
    expect(values.heelHeight).toBe('5 1/2"');
    const again = formToRequest(values, 'imperial');
    expect(again.request).toEqual(first.request);
  });
});

describe('field paths', () => {
  it('maps schema and server paths to form fields', () => {
    expect(fieldForPath(['loads', 'snow', 'pg'])).toBe('snowPg');
    expect(fieldForPath(['overhang', 'right'])).toBe('overhangRight');
    expect(fieldForPath(['webBraces', 2])).toBe('webBraces');
    expect(fieldForPath(['nonsense'])).toBeUndefined();
    expect(serverFieldErrors({ 'design.span': 'Too long', mark: 'Taken', x: 'Other' })).toEqual({
      errors: { span: 'Too long', mark: 'Taken' },
      unplaced: ['Other'],
    });
  });
});
