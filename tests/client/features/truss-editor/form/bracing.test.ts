import { describe, expect, it } from 'vitest';
import { toEngineInput } from '../../../../../shared/api/design';
import {
  designToFormValues,
  formToRequest,
} from '../../../../../src/features/truss-editor/form/convert';
import { newTrussFormValues } from '../../../../../src/features/truss-editor/form/values';

// Typical loads, DESIGN.md §1 (common practice): TCLL 20, TCDL 10, BCLL 0, BCDL 10 psf.
const LOADS = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 };
const form = () => ({ ...newTrussFormValues('imperial', LOADS), mark: 'T1' });
const LINE = { mark: 'T1', quantity: 1, plies: 1 };

describe('the Bracing section of the truss form', () => {
  it('a ceiling, sheathing and either web brace send no bracing (the design defaults)', () => {
    const r = formToRequest(form(), 'imperial');
    expect(r.request?.design.bracing).toBeUndefined();
  });

  it('no ceiling with bracing at 6 ft and purlins at 2 ft reach the engine in mm (1 in = 25.4 mm)', () => {
    const r = formToRequest(
      {
        ...form(),
        ceiling: false,
        bottomChordBracing: `6'-0"`,
        sheathing: false,
        purlinSpacing: `2'`,
        webBrace: 'tBrace',
      },
      'imperial',
    );
    if (!r.request || !r.input) throw new Error(JSON.stringify(r.errors));
    expect(r.request.design.bracing).toEqual({
      ceiling: false,
      bottomChordBracing: 72,
      sheathing: false,
      purlinSpacing: 24,
      webBrace: 'tBrace',
    });
    expect(toEngineInput(r.input).bracing).toEqual({
      ceiling: false,
      bottomChordBracing: 72 * 25.4,
      purlinSpacing: 24 * 25.4,
      webBrace: 'tBrace',
    });
  });

  it('no ceiling and a blank spacing leaves the 10 ft default to the engine', () => {
    const r = formToRequest({ ...form(), ceiling: false }, 'imperial');
    expect(r.request?.design.bracing).toEqual({ ceiling: false });
  });

  it('no sheathing needs a purlin spacing, said beside the field', () => {
    const r = formToRequest({ ...form(), sheathing: false }, 'imperial');
    expect(r.request).toBeNull();
    expect(r.errors.purlinSpacing).toBe(
      'Enter the purlin spacing (the top chord has no sheathing)',
    );
  });

  it('a spacing out of range speaks the schema message (12 in to 20 ft)', () => {
    const r = formToRequest({ ...form(), sheathing: false, purlinSpacing: `30'` }, 'imperial');
    expect(r.errors.purlinSpacing).toBe('Purlin spacing must be between 12 in and 20 ft');
  });

  it('a stored line opens with its bracing as typed', () => {
    const v = designToFormValues(
      {
        units: 'imperial',
        profile: 'fink',
        span: 336,
        pitch: 6,
        bracing: { ceiling: false, bottomChordBracing: 72, purlinSpacing: 24, webBrace: 'lateral' },
      },
      LINE,
      form(),
    );
    expect(v).toMatchObject({
      ceiling: false,
      bottomChordBracing: `6'-0"`,
      // Stored before the sheathing flag: a purlin spacing alone means no sheathing.
      sheathing: false,
      purlinSpacing: `2'-0"`,
      webBrace: 'lateral',
    });
    const back = formToRequest(v, 'imperial');
    expect(back.request?.design.bracing).toEqual({
      ceiling: false,
      bottomChordBracing: 72,
      sheathing: false,
      purlinSpacing: 24,
      webBrace: 'lateral',
    });
  });
});
