import { describe, expect, it } from 'vitest';
import { chordBracing, webBracing } from '../../../../server/services/designDrawingPdf/sheet';

const lateral = (at: string, joint: string) =>
  `Continuous lateral brace (2x4) at mid-length, ${at} from joint ${joint}, nailed to this web in every truss of the run and tied back with diagonal bracing at each end; or a 2x4 T-brace of the web's grade nailed to its narrow face over at least 90 % of its length.`;

describe('the design drawing’s bracing notes', () => {
  it('states a shared method once and where each web’s brace goes', () => {
    const lines = webBracing([
      { id: 'CH', piece: 'W3', bracing: lateral(`4'-2 1/8"`, 'C') },
      { id: 'DJ', piece: 'W6', bracing: lateral(`4'-2 1/8"`, 'D') },
    ]);
    expect(lines).toEqual([
      `Braced webs: CH (W3) 4'-2 1/8" from joint C; DJ (W6) 4'-2 1/8" from joint D. Each: Continuous lateral brace (2x4) at mid-length, nailed to this web in every truss of the run and tied back with diagonal bracing at each end; or a 2x4 T-brace of the web's grade nailed to its narrow face over at least 90 % of its length.`,
    ]);
  });
  it('keeps each web’s own sentence when the methods differ or there is one web', () => {
    const one = [{ id: 'CH', piece: 'W3', bracing: lateral(`4'-0"`, 'C') }];
    expect(webBracing(one)).toHaveLength(1);
    expect(webBracing(one)[0]).toMatch(/^CH \(W3\): Continuous lateral brace/);
    const mixed = [...one, { id: 'DJ', piece: 'W6', bracing: 'A 2x6 T-brace of the web…' }];
    expect(webBracing(mixed)).toHaveLength(2);
  });
  it('says how the chords are restrained as the line was designed, purlins and no ceiling too', () => {
    expect(
      chordBracing([
        { role: 'topChord', bracing: `Braced out of plane by purlins at 2'-0" o.c.` },
        {
          role: 'bottomChord',
          bracing: `No ceiling: lateral bracing at 10'-0" o.c. along the bottom chord.`,
        },
        { role: 'web', bracing: 'No lateral brace needed.' },
      ]),
    ).toEqual([
      `Top chord: braced out of plane by purlins at 2'-0" o.c.`,
      `Bottom chord: no ceiling: lateral bracing at 10'-0" o.c. along the bottom chord.`,
    ]);
  });
});
