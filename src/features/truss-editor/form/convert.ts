import {
  designInputSchema,
  WEB_BRACE_KINDS,
  type DesignInput,
  type DesignInputDraft,
  type WebBraceKind,
} from '../../../../shared/api/design';
import { omit } from 'zod/mini';
import { createLineSchema } from '../../../../shared/api/orders';
import {
  formatFeetInches,
  formatInches,
  isParseError,
  parseLength,
  parsePitch,
} from '../../../../shared/engine/format';
import { PROFILE_KINDS } from '../../../../shared/engine/profiles';
import { MM_PER_INCH } from '../../../../shared/engine/units';
import { pointLoadRows, pointLoadsOf } from './point-loads';
import type { TrussFormErrors, TrussFormField, TrussFormValues } from './values';

/** The unit system of the form. */
export type FormUnits = 'imperial' | 'metric';

/** Body of "Save truss": the line fields and the design input in the user's units. */
export interface LineRequest {
  mark: string;
  quantity: number;
  plies: number;
  design: DesignInputDraft;
}

/**
 * The outcome of reading the form. `input` is the checked design whenever the design fields are
 * valid (so the drawing updates while the mark is still empty); `request` only when everything is.
 */
export interface FormReading {
  input: DesignInput | null;
  request: LineRequest | null;
  errors: TrussFormErrors;
}

const LENGTH_FIELDS = new Set<TrussFormField>([
  'span',
  'heelHeight',
  'overhangLeft',
  'overhangRight',
  'spacing',
  'depth',
  'bearingWidth',
  'bottomChordBracing',
  'purlinSpacing',
]);

/** Rounds away binary noise (342.49999… in) so the request carries what the user typed. */
const clean = (v: number) => Math.round(v * 1e6) / 1e6;

/**
 * Reads the text of the form into numbers in the user's units (inches or mm, psf or kPa) and
 * checks them with the same `designInputSchema` the API uses. Text that cannot be read gets the
 * parser's message; values out of range get the schema's message, both beside their field.
 */
export function formToRequest(values: TrussFormValues, units: FormUnits): FormReading {
  const errors: TrussFormErrors = {};
  const length = (field: TrussFormField, optional = false): number | undefined => {
    const raw = String(values[field]).trim();
    if (raw === '') {
      if (!optional) errors[field] = 'Enter a length';
      return undefined;
    }
    const mm = parseLength(raw, units);
    if (isParseError(mm)) {
      errors[field] = mm.error;
      return undefined;
    }
    return clean(units === 'imperial' ? mm / MM_PER_INCH : mm);
  };
  const pitch = (field: 'pitch' | 'bottomPitch'): number | undefined => {
    const p = parsePitch(values[field]);
    if (isParseError(p)) {
      errors[field] = p.error;
      return undefined;
    }
    return clean(p);
  };
  const number = (field: TrussFormField, label: string, optional = true): number | undefined => {
    const raw = String(values[field]).trim();
    if (raw === '') {
      if (!optional) errors[field] = `Enter ${label}`;
      return undefined;
    }
    const n = Number(raw);
    if (!Number.isFinite(n)) {
      errors[field] = `${label} must be a number`;
      return undefined;
    }
    return n;
  };

  const kind = values.profile;
  const flat = kind === 'flat';
  const snowPg = number('snowPg', 'Ground snow load');
  const emptyAsZero = (field: TrussFormField) =>
    values[field].toString().trim() === '' ? 0 : length(field);
  const draft: DesignInputDraft = {
    units,
    profile: kind,
    span: length('span') as number,
    ...(!flat && { pitch: pitch('pitch') }),
    heelHeight: emptyAsZero('heelHeight') as number,
    overhang: {
      left: emptyAsZero('overhangLeft') as number,
      right: emptyAsZero('overhangRight') as number,
    },
    spacing: length('spacing', true),
    plies: number('plies', 'plies', false) as number,
    ...(kind === 'scissor' && { bottomPitch: pitch('bottomPitch') }),
    ...(flat && { depth: length('depth'), panels: number('panels', 'Panels') }),
    loads: {
      tcll: number('tcll', 'TCLL', false) as number,
      tcdl: number('tcdl', 'TCDL', false) as number,
      bcll: number('bcll', 'BCLL', false) as number,
      bcdl: number('bcdl', 'BCDL', false) as number,
      bcllNonConcurrent: number('bcllNonConcurrent', 'Non-concurrent BCLL'),
      ...(snowPg !== undefined &&
        snowPg > 0 && {
          snow: {
            pg: snowPg,
            ce: number('snowCe', 'Exposure factor Ce'),
            ct: number('snowCt', 'Thermal factor Ct'),
            is: number('snowIs', 'Importance factor Is'),
            slippery: values.snowSlippery,
          },
        }),
      windUplift: number('windUplift', 'Wind uplift'),
    },
    lumber: {
      ...(values.lumberTop && { topChord: values.lumberTop }),
      ...(values.lumberBottom && { bottomChord: values.lumberBottom }),
      ...(values.lumberWebs && { webs: values.lumberWebs }),
    },
    bearingWidth: length('bearingWidth', true),
    deflection: {
      live: number('deflectionLive', 'Live-load deflection limit'),
      total: number('deflectionTotal', 'Total-load deflection limit'),
    },
    webBraces: values.webBraces
      .split(/[\s,;]+/)
      .map((s) => s.trim().toUpperCase())
      .filter(Boolean),
    ...pointLoadsOf(values.pointLoads ?? [], units, errors),
    ...bracingOf(values, length),
  };
  const line = omit(createLineSchema, { design: true }).safeParse({
    mark: values.mark,
    quantity: number('quantity', 'a quantity', false),
    plies: draft.plies,
  });
  if (!line.success) {
    for (const issue of line.error.issues) {
      const field = fieldForPath(issue.path);
      if (field && !errors[field]) errors[field] = issue.message;
    }
  }
  const parsed = designInputSchema.safeParse(stripUndefined(draft));
  const designIssues: TrussFormErrors = {};
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = fieldForPath(issue.path) ?? 'span';
      const message =
        field === 'pointLoads' && typeof issue.path[1] === 'number'
          ? `Point load ${issue.path[1] + 1}: ${issue.message}`
          : issue.message;
      if (!errors[field] && !designIssues[field]) designIssues[field] = message;
    }
  }
  Object.assign(errors, designIssues);
  const input = parsed.success && !hasDesignError(errors) ? parsed.data : null;
  if (!input || !line.success || Object.keys(errors).length > 0) {
    return { input, request: null, errors };
  }
  return {
    input,
    request: {
      mark: line.data.mark,
      quantity: line.data.quantity,
      plies: line.data.plies,
      design: stripUndefined(draft),
    },
    errors,
  };
}

/**
 * The Bracing section as the request's `bracing`: nothing when a ceiling and sheathing brace the
 * chords and either web brace will do (the design's defaults), so older lines stay as they were.
 */
function bracingOf(
  values: TrussFormValues,
  length: (field: TrussFormField, optional?: boolean) => number | undefined,
): Pick<DesignInputDraft, 'bracing'> {
  const ceiling = values.ceiling ?? true;
  const sheathing = values.sheathing ?? true;
  const webBrace = values.webBrace ?? 'either';
  if (ceiling && sheathing && webBrace === 'either') return {};
  return {
    bracing: {
      ...(!ceiling && {
        ceiling: false,
        bottomChordBracing: length('bottomChordBracing', true),
      }),
      ...(!sheathing && { sheathing: false, purlinSpacing: length('purlinSpacing', true) }),
      ...(webBrace !== 'either' && { webBrace }),
    },
  };
}

const LINE_FIELDS = new Set<TrussFormField>(['mark', 'quantity']);
const hasDesignError = (errors: TrussFormErrors) =>
  Object.keys(errors).some((f) => !LINE_FIELDS.has(f as TrussFormField));

/** Drops undefined keys (deeply) so the request and the stored design stay minimal. */
function stripUndefined<T>(value: T): T {
  if (Array.isArray(value)) return value.map(stripUndefined) as T;
  if (value && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value)
        .filter(([, v]) => v !== undefined)
        .map(([k, v]) => [k, stripUndefined(v)]),
    ) as T;
  }
  return value;
}

const PATHS: Record<string, TrussFormField> = {
  mark: 'mark',
  quantity: 'quantity',
  plies: 'plies',
  profile: 'profile',
  units: 'span',
  span: 'span',
  pitch: 'pitch',
  heelHeight: 'heelHeight',
  overhang: 'overhangLeft',
  'overhang.left': 'overhangLeft',
  'overhang.right': 'overhangRight',
  spacing: 'spacing',
  bottomPitch: 'bottomPitch',
  depth: 'depth',
  panels: 'panels',
  loads: 'tcll',
  'loads.tcll': 'tcll',
  'loads.tcdl': 'tcdl',
  'loads.bcll': 'bcll',
  'loads.bcdl': 'bcdl',
  'loads.bcllNonConcurrent': 'bcllNonConcurrent',
  'loads.snow': 'snowPg',
  'loads.snow.pg': 'snowPg',
  'loads.snow.ce': 'snowCe',
  'loads.snow.ct': 'snowCt',
  'loads.snow.is': 'snowIs',
  'loads.snow.slippery': 'snowSlippery',
  'loads.windUplift': 'windUplift',
  'lumber.topChord': 'lumberTop',
  'lumber.bottomChord': 'lumberBottom',
  'lumber.webs': 'lumberWebs',
  bearingWidth: 'bearingWidth',
  'deflection.live': 'deflectionLive',
  'deflection.total': 'deflectionTotal',
  webBraces: 'webBraces',
  pointLoads: 'pointLoads',
  'bracing.ceiling': 'ceiling',
  'bracing.bottomChordBracing': 'bottomChordBracing',
  'bracing.sheathing': 'sheathing',
  'bracing.purlinSpacing': 'purlinSpacing',
  'bracing.webBrace': 'webBrace',
};

/**
 * The form field of a schema path (`['loads', 'snow', 'pg']` → `snowPg`); array indices and a
 * leading `design` (the server's request path) are ignored. Undefined when no field matches.
 */
export function fieldForPath(path: readonly PropertyKey[]): TrussFormField | undefined {
  const parts = path.filter((p): p is string => typeof p === 'string');
  if (parts[0] === 'design' && parts.length > 1) parts.shift();
  for (let n = parts.length; n > 0; n--) {
    const field = PATHS[parts.slice(0, n).join('.')];
    if (field) return field;
  }
  return undefined;
}

/** Server field errors (`{ 'design.span': '…' }` or `{ span: '…' }`) as form messages. */
export function serverFieldErrors(fields: Record<string, string>): {
  errors: TrussFormErrors;
  unplaced: string[];
} {
  const errors: TrussFormErrors = {};
  const unplaced: string[] = [];
  for (const [key, message] of Object.entries(fields)) {
    const field = fieldForPath(key.split(/[.[\]]+/).filter(Boolean));
    if (field && !errors[field]) errors[field] = message;
    else unplaced.push(message);
  }
  return { errors, unplaced };
}

const isWebBrace = (v: unknown): v is WebBraceKind => WEB_BRACE_KINDS.some((k) => k === v);

const isKind = (v: unknown): v is TrussFormValues['profile'] =>
  PROFILE_KINDS.some((k) => k.kind === v);

/**
 * A stored design input (user units) back as form text: imperial spans in feet-inches
 * (`28'-6 1/2"`), short lengths in inches (`3 1/2"`), metric in whole millimetres. Missing
 * fields keep the value of `base` (the new-line defaults).
 */
export function designToFormValues(
  design: Record<string, unknown>,
  line: { mark: string; quantity: number; plies: number },
  base: TrussFormValues,
): TrussFormValues {
  const units: FormUnits = design.units === 'metric' ? 'metric' : 'imperial';
  const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);
  const long = (v: unknown, fallback: string) => {
    const n = num(v);
    if (n === undefined) return fallback;
    return units === 'imperial' ? formatFeetInches(n * MM_PER_INCH) : String(Math.round(n));
  };
  const short = (v: unknown, fallback: string) => {
    const n = num(v);
    if (n === undefined) return fallback;
    return units === 'imperial' ? formatInches(n * MM_PER_INCH) : String(Math.round(n));
  };
  const plain = (v: unknown, fallback = '') => (num(v) === undefined ? fallback : String(v));
  const rise = (v: unknown, fallback: string) => (num(v) === undefined ? fallback : `${v}/12`);
  const obj = (v: unknown) => (v && typeof v === 'object' ? (v as Record<string, unknown>) : {});
  const overhang = design.overhang;
  const oh = typeof overhang === 'number' ? { left: overhang, right: overhang } : obj(overhang);
  const loads = obj(design.loads);
  const snow = obj(loads.snow);
  const lumber = obj(design.lumber);
  const lumberText = (v: unknown) =>
    typeof v === 'string' ? v : Array.isArray(v) && v.length === 1 ? String(v[0]) : '';
  const deflection = obj(design.deflection);
  const bracing = obj(design.bracing);
  // Stored before the sheathing flag existed, a purlin spacing alone meant "no sheathing".
  const sheathing = bracing.sheathing ?? num(bracing.purlinSpacing) === undefined;
  return {
    ...base,
    mark: line.mark,
    quantity: String(line.quantity),
    plies: String(line.plies),
    profile: isKind(design.profile) ? design.profile : base.profile,
    span: long(design.span, base.span),
    pitch: rise(design.pitch, base.pitch),
    heelHeight: short(design.heelHeight ?? 0, base.heelHeight),
    overhangLeft: short(oh.left ?? 0, base.overhangLeft),
    overhangRight: short(oh.right ?? 0, base.overhangRight),
    spacing: short(design.spacing, base.spacing),
    bottomPitch: rise(design.bottomPitch, base.bottomPitch),
    depth: long(design.depth, base.depth),
    panels: plain(design.panels, base.panels),
    tcll: plain(loads.tcll, base.tcll),
    tcdl: plain(loads.tcdl, base.tcdl),
    bcll: plain(loads.bcll, base.bcll),
    bcdl: plain(loads.bcdl, base.bcdl),
    bcllNonConcurrent: plain(loads.bcllNonConcurrent),
    snowPg: plain(snow.pg),
    snowCe: plain(snow.ce),
    snowCt: plain(snow.ct),
    snowIs: plain(snow.is),
    snowSlippery: snow.slippery === true,
    windUplift: plain(loads.windUplift),
    lumberTop: lumberText(lumber.topChord),
    lumberBottom: lumberText(lumber.bottomChord),
    lumberWebs: lumberText(lumber.webs),
    webBraces: Array.isArray(design.webBraces) ? design.webBraces.join(', ') : '',
    bearingWidth: short(design.bearingWidth, base.bearingWidth),
    deflectionLive: plain(deflection.live, base.deflectionLive),
    deflectionTotal: plain(deflection.total, base.deflectionTotal),
    pointLoads: pointLoadRows(design.pointLoads, units),
    ceiling: bracing.ceiling !== false,
    bottomChordBracing: long(bracing.bottomChordBracing, ''),
    sheathing: sheathing !== false,
    purlinSpacing: long(bracing.purlinSpacing, ''),
    webBrace: isWebBrace(bracing.webBrace) ? bracing.webBrace : 'either',
  };
}

/** True for fields whose text is a length in the plant's units. */
export const isLengthField = (field: TrussFormField) => LENGTH_FIELDS.has(field);
