import { ZodError } from 'zod';
import { designInputSchema, toEngineInput } from '../../shared/api/design';
import { analyzeTruss, designTruss, isEngineError, presentDesign } from '../../shared/engine';
import { planCutting } from '../../shared/engine/cutting';
import { cutInputSchema } from './cutSchema';
import { trussModelSchema } from './modelSchema';

/** The CLI's error body: an engine error code (or `invalid`), a message and optional details. */
export interface CliError {
  error: { code: string; message: string; details?: Record<string, unknown> };
}

/** `analyze`: a TrussModel (any consistent units) → member forces, reactions, residual. */
export function analyzeCommand(json: unknown) {
  const result = analyzeTruss(trussModelSchema.parse(json));
  return {
    members: result.members.map((m) => ({ id: m.id, force: m.force })),
    reactions: result.reactions.map((r) => ({ joint: r.joint, rx: r.rx, ry: r.ry })),
    classification: result.classification,
    ...(result.displacements && { displacements: result.displacements }),
    residual: result.residual,
  };
}

/** `design`: a design request (the API's preview body) → the design in the request's units. */
export function designCommand(json: unknown) {
  const input = designInputSchema.parse(json);
  return presentDesign(designTruss(toEngineInput(input)), input.units);
}

/** Rounds away binary noise (0.30000000000000004) so printed lengths read as typed. */
const tidy = (v: number) => Math.round(v * 1e9) / 1e9;

/**
 * `cut`: stock lengths (cost defaults to the length), kerf, trim and pieces → the least-cost
 * lumber plan, its lower bound and whether it is proven optimal.
 */
export async function cutCommand(json: unknown) {
  const input = cutInputSchema.parse(json);
  // Loaded here so that analyze and design never load the LP solver's WebAssembly module.
  const { loadLpSolver } = await import('../services/lp');
  const plan = planCutting(
    {
      stocks: input.stocks.map((s) => ({ ...s, cost: s.cost ?? s.length })),
      kerf: input.kerf,
      trim: input.trim,
      pieces: input.pieces.map((p) => ({ length: p.length, quantity: p.quantity })),
    },
    { lp: await loadLpSolver(), timeLimitMs: 2000 },
  );
  return {
    boards: plan.boards.map((b) => ({
      stock: b.stock,
      pieces: b.pieces.map((p) => p.length),
      offcut: tidy(b.offcut),
    })),
    boardCount: plan.boardCount,
    totalCost: tidy(plan.totalCost),
    lowerBound: { cost: tidy(plan.lowerBound.cost) },
    optimal: plan.optimal,
  };
}

/**
 * Any failure as the CLI's error body: engine errors keep their code and details, zod errors
 * become `invalid` with one line per field. Anything else is a fault of the program, not of the
 * input: code `internal`.
 */
export function toCliError(e: unknown): CliError {
  if (isEngineError(e)) {
    return {
      error: { code: e.code, message: e.message, ...(e.details && { details: e.details }) },
    };
  }
  if (e instanceof ZodError) {
    const issues = e.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    const lines = issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message));
    return { error: { code: 'invalid', message: lines.join('; '), details: { issues } } };
  }
  return { error: { code: 'internal', message: e instanceof Error ? e.message : String(e) } };
}
