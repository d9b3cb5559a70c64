import type { PresentedDesign } from '../../../shared/engine/design';
import { GRADE_DATA, isLumberGrade } from '../../../shared/engine/lumber';
import { PROFILE_KIND_LABELS, type ProfileKind } from '../../../shared/engine/profiles';
import { formatNumber } from '../quotePdf/format';
import {
  loadRows,
  overallHeight,
  overhangText,
  overhangTips,
  parsedInput,
  spacingText,
  type PaperOverhang,
} from '../designFacts';
import { jointPlateRows } from '../shopPaper/plateSchedule';
import { lengthText, shortLengthText, type ShopLine } from '../shopPaper/lines';
import { pieceOutlines, plateOutlines, shopDrawingGeometry } from '../shopPaper/drawing';
import { cutStoredDesign } from '../cutList';
import type { ShopDrawingGeometry } from '../../../shared/api/shopPaper';

/** Who and where, as the sheet's title block prints them. */
export interface DesignDrawingContext {
  plant: { name: string; address: string | null; phone?: string; email?: string };
  order: { number: string; job: string; jobAddress: string; builder: string };
  line: ShopLine & {
    reviewState: string;
    reviewedBy: string | null;
    reviewedAt: Date | null;
  };
  printedAt: Date;
}

/** Label/value rows of one block of the sheet. */
export type Rows = [string, string][];

/** Everything one truss design drawing prints (IRC 2021 R802.10.1), as text. */
export interface DesignDrawingSheet {
  title: { mark: string; description: string; quantity: string; profile: string };
  plant: DesignDrawingContext['plant'];
  order: DesignDrawingContext['order'];
  review: { status: string; approved: boolean };
  criteria: Rows;
  loads: Rows;
  adjustments: string[];
  reactions: string[][];
  joints: string[][];
  members: string[][];
  webCompression: string;
  bracing: string[];
  deflection: Rows;
  connections: Rows;
  warnings: string[];
  cautions: string[];
  engineVersion: string;
  printedAt: Date;
  /** The drawing: pieces, plates, joint letters, panel-point chains; overhangs and heights. */
  geometry: ShopDrawingGeometry;
  overhangs: PaperOverhang[];
  heights: { heel: number; heelText: string; overall: number; overallText: string };
}

/** "1,034 lbf" or "4.600 kN". */
export function forceText(d: PresentedDesign, v: number): string {
  return d.units.force === 'lbf' ? `${formatNumber(v, 0)} lbf` : `${formatNumber(v, 2, true)} kN`;
}

/** A deflection in decimal inches or mm: "0.121 in." or "3.1 mm". */
const deflText = (d: PresentedDesign, v: number) =>
  d.units.length === 'in' ? `${v.toFixed(3)} in.` : `${v.toFixed(1)} mm`;

/** "2x4 Douglas Fir-Larch DF-L No.2" from "2x4 DFL-2". */
export function lumberText(id: string): string {
  const [size, grade] = id.trim().split(/\s+/);
  if (!grade || !isLumberGrade(grade)) return id;
  const g = GRADE_DATA[grade];
  return `${size} ${g.species} ${g.label}`;
}

const pitchText = (input: Record<string, unknown>) => {
  const p = Number(input.pitch);
  if (input.profile === 'flat' || !Number.isFinite(p) || p <= 0) return 'Flat (0/12)';
  return `${Number(p.toFixed(3))}/12`;
};

/** The sheet's content from a stored line: every R802.10.1 item, the cautions, the engine. */
export function designDrawingSheet(ctx: DesignDrawingContext): DesignDrawingSheet {
  const { line } = ctx;
  const d = line.design;
  const input = parsedInput(line.designInput);
  const len = (v: number) => lengthText(d, v);
  const short = (v: number) => shortLengthText(d, v);
  const force = (v: number) => forceText(d, v);
  const profile = String(line.designInput.profile ?? '');
  const kind = PROFILE_KIND_LABELS[profile as ProfileKind] ?? profile;
  const height = overallHeight(d);
  const bottomPitch = Number(line.designInput.bottomPitch);

  const criteria: Rows = [
    ['Truss type', kind],
    ['Slope (pitch)', pitchText(line.designInput)],
    ...(Number.isFinite(bottomPitch) && bottomPitch > 0
      ? ([['Bottom-chord slope', `${Number(bottomPitch.toFixed(3))}/12`]] as Rows)
      : []),
    ['Span (out to out)', d.span.text],
    ['Heel height', d.heelHeight.requested.text],
    ['Overall height', len(height)],
    ['Overhangs', input ? overhangText(input) : '—'],
    ['Spacing', input ? spacingText(input) : '—'],
    ['Plies', String(line.plies)],
    ...(input
      ? ([
          [
            'Deflection limits',
            `L/${input.deflection.live} live, L/${input.deflection.total} total`,
          ],
        ] as Rows)
      : []),
  ];

  const byCd = new Map<number, string>();
  for (const c of d.combinations) if (!byCd.has(c.cd)) byCd.set(c.cd, c.name);
  const adjustments = [
    `Load duration CD ${[...byCd].map(([cd, name]) => `${cd.toFixed(2)} (${name})`).join(', ')}: each ASD combination of ASCE 7-16 §2.4.1 takes the CD of its shortest load.`,
    ...d.notes.filter((n) => /Cr = /.test(n)),
    'Dry service (CM = 1.0), normal temperatures (Ct = 1.0); lumber NDS 2018 Supplement Tables 4A/4B; plate values from the plant catalog' +
      (d.demoPlates ? ' (demo catalog: invented values, not for construction).' : '.'),
  ];

  const reactions = d.reactions.map((r) => {
    const b = d.bearing.find((x) => x.joint === r.joint);
    const required = b ? short(b.width.value * Math.min(1, Math.max(b.ratio, 0))) : '—';
    return [
      r.joint,
      b ? short(b.width.value) : '—',
      required,
      force(r.maxDown),
      r.maxUp > 0 ? force(r.maxUp) : 'None',
      force(r.maxHorizontal),
    ];
  });

  const plateRows = jointPlateRows(line);
  const joints = d.joints.map((j) => {
    const p = plateRows.find((r) => r.joint === j.id);
    const plate = d.plates.find((x) => x.joint === j.id);
    return [
      j.id,
      len(j.x),
      len(j.y),
      p ? `${p.plate}, ${p.gauge} ga, both faces` : plate?.message ? 'No plate fits' : '—',
      p ? `${p.widthIn} × ${p.lengthIn} in.` : '—',
      p ? p.position.replace(/ of the joint$/, '') : '—',
      plate?.governing
        ? `${plate.governing.check} ${plate.governing.member} ${plate.governing.ratio.toFixed(2)}`
        : '—',
    ];
  });

  const members = d.members.map((m) => [
    m.id,
    m.piece,
    lumberText(m.lumber),
    m.length.text,
    m.maxCompression > 0 ? force(m.maxCompression) : '—',
    m.maxTension > 0 ? force(m.maxTension) : '—',
    m.csi.toFixed(2),
  ]);

  const webs = d.members.filter((m) => m.role === 'web');
  const worst = [...webs].sort((a, b) => b.maxCompression - a.maxCompression)[0];
  const webCompression = worst
    ? `Maximum web compression ${force(worst.maxCompression)} in ${worst.id} (${worst.length.text}).`
    : 'No webs.';
  const bracing = [...webBracing(d.members.filter((m) => m.braced)), ...chordBracing(d.members)];

  const defl = d.deflection;
  const roller = d.additional?.rollerMovement;
  const dText = (c: NonNullable<typeof defl.live>) =>
    `L/${c.ratio ?? '∞'} (limit L/${c.limit}), max ${deflText(d, c.max)} at ${c.joint} (${c.load})`;
  const deflection: Rows = [
    ...(defl.live ? ([['Live-load vertical', dText(defl.live)]] as Rows) : []),
    ['Total-load vertical', dText(defl.total)],
    [
      'Horizontal',
      roller
        ? `${deflText(d, Math.abs(roller.movement))} ${roller.movement >= 0 ? 'outward' : 'inward'} at roller ${roller.joint} (${roller.load})`
        : `Bearing ${d.reactions[d.reactions.length - 1]?.joint ?? ''} slides (roller); horizontal movement is not calculated for this design`,
    ],
  ];

  const connections: Rows = [
    [
      'Truss-to-girder',
      input?.pointLoads?.length
        ? 'Girder: carries the concentrated loads listed above; each carried truss hangs on a connector the building designer specifies for its reaction'
        : 'None: carries no other truss; bearings anchored for the reactions',
    ],
    [
      'Ply-to-ply',
      d.plyConnections?.length
        ? `${line.plies} plies, fastened chord by chord:`
        : line.plies > 1
          ? `${line.plies} plies, each plated on both faces, fastened together per the reviewer's ply-to-ply schedule`
          : 'Single ply: none',
    ],
    // The engine's words lead with "Top chord, 3-ply: "; the row's label says the chord.
    ...(d.plyConnections ?? []).map((c): [string, string] => [
      `  ${c.chord === 'top' ? 'Top' : 'Bottom'} chord`,
      c.text.replace(/^(Top|Bottom) chord, \d+-ply: /, ''),
    ]),
  ];

  const reviewStatus =
    line.reviewState === 'approved'
      ? `Approved by ${line.reviewedBy ?? 'the design reviewer'}${line.reviewedAt ? ` on ${line.reviewedAt.toISOString().slice(0, 10)}` : ''}`
      : line.reviewState === 'returned'
        ? 'Returned by the design reviewer: preliminary, not for construction'
        : 'Waiting for review: preliminary, not for construction';

  const overhangs = overhangTips(input, d);
  // The pieces as the saw cuts them (tails included), like the shop drawing.
  const outlines = pieceOutlines(d, cutStoredDesign({ ...line, designResult: d }));
  const geometry = shopDrawingGeometry(d, outlines, plateOutlines(d, plateRows));
  widenBounds(geometry);

  return {
    title: {
      mark: line.mark,
      description: line.description,
      quantity: `${line.quantity} truss${line.quantity === 1 ? '' : 'es'}`,
      profile: kind,
    },
    plant: ctx.plant,
    order: ctx.order,
    review: { status: reviewStatus, approved: line.reviewState === 'approved' },
    criteria,
    loads: input ? loadRows(input) : [['Loads', 'Stored input unreadable; see the design record']],
    adjustments,
    reactions,
    joints,
    members,
    webCompression,
    bracing,
    deflection,
    connections,
    warnings: d.warnings,
    cautions: d.cautions,
    engineVersion: line.engineVersion || d.engineVersion,
    printedAt: ctx.printedAt,
    geometry,
    overhangs,
    heights: {
      heel: d.heelHeight.requested.value,
      heelText: d.heelHeight.requested.text,
      overall: height,
      overallText: len(height),
    },
  };
}

/** Room in the bounds, left and right, for the height dimensions beside the truss. */
function widenBounds(g: ShopDrawingGeometry) {
  const side = (g.bounds.maxX - g.bounds.minX) * 0.06;
  g.bounds.minX -= side;
  g.bounds.maxX += side;
}

/** Where a web's brace goes, cut out of its bracing sentence: "4'-2 1/8" from joint C". */
const BRACE_AT = / at mid-length, (.+?) from joint (\w+),/;

/**
 * The braced webs as the sheet states them: one sentence for the method when every web shares it,
 * then each web with where its brace goes; else each web's own sentence.
 */
export function webBracing(webs: { id: string; piece: string; bracing: string }[]): string[] {
  const own = webs.map((m) => `${m.id} (${m.piece}): ${m.bracing.replace(/\.$/, '')}.`);
  if (webs.length < 2) return own;
  const split = webs.map((m) => ({ m, at: BRACE_AT.exec(m.bracing) }));
  if (split.some((x) => !x.at)) return own;
  const methods = new Set(split.map((x) => x.m.bracing.replace(BRACE_AT, ' at mid-length,')));
  if (methods.size !== 1) return own;
  const where = split
    .map((x) => `${x.m.id} (${x.m.piece}) ${x.at![1]} from joint ${x.at![2]}`)
    .join('; ');
  return [`Braced webs: ${where}. Each: ${[...methods][0].replace(/\.$/, '')}.`];
}

/** The chords' restraint as the design assumed it (sheathing or purlins, ceiling or bracing). */
export function chordBracing(members: { role: string; bracing: string }[]): string[] {
  const say = (role: string, name: string) => {
    const text = members.find((m) => m.role === role)?.bracing;
    return text
      ? `${name}: ${text.charAt(0).toLowerCase()}${text.slice(1).replace(/\.$/, '')}.`
      : null;
  };
  return [say('topChord', 'Top chord'), say('bottomChord', 'Bottom chord')].filter(
    (v): v is string => v !== null,
  );
}
