import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

/**
 * The `truss` CLI as a user runs it: a child process (`npx tsx server/cli/truss.ts`), JSON on
 * stdout, exit codes. Lives under tests/shared so the unit project runs it.
 */

const run = (args: string[], stdin?: string) => {
  const r = spawnSync('npx', ['tsx', 'server/cli/truss.ts', ...args], {
    cwd: process.cwd(),
    input: stdin,
    encoding: 'utf8',
    timeout: 60000,
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
};

const json = (s: string) => JSON.parse(s) as Record<string, unknown>;

const expectError = (r: ReturnType<typeof run>, code: string) => {
  expect(r.code).toBe(2);
  const body = json(r.stdout) as { error: { code: string; message: string } };
  expect(Object.keys(body)).toEqual(['error']);
  expect(body.error.code).toBe(code);
  expect(typeof body.error.message).toBe('string');
  expect(body.error.message.length).toBeGreaterThan(0);
  return body.error;
};

describe('truss CLI', { timeout: 60000 }, () => {
  it('analyze: the Warren truss of references §5 Example 1', () => {
    const r = run(['analyze', 'server/cli/examples/analyze-warren.json']);
    expect(r.code).toBe(0);
    const out = json(r.stdout) as {
      members: { id: string; force: number }[];
      reactions: { joint: string; rx: number; ry: number }[];
      classification: string;
      residual: number;
    };
    // Recomputed answers (references §5, C): RA = 3500, RE = 4500 lb; AB 4041.5 C, AC 2020.7 T,
    // BC 2886.8 T, BD 3464.1 C, CD 1732.1 T, CE 2598.1 T, DE 5196.2 C.
    const expected: Record<string, number> = {
      AB: -4041.5,
      AC: 2020.7,
      BC: 2886.8,
      BD: -3464.1,
      CD: 1732.1,
      CE: 2598.1,
      DE: -5196.2,
    };
    for (const m of out.members) expect(m.force).toBeWithin(expected[m.id], { abs: 0.06 });
    expect(out.reactions.map((x) => x.ry)).toEqual([
      expect.closeTo(3500, 6),
      expect.closeTo(4500, 6),
    ]);
    expect(out.classification).toBe('determinate');
    expect(out.residual).toBeLessThan(1e-9);
  });

  it('design: the 24 ft Fink example, in its own units, with the cautions', () => {
    const r = run(['design', 'server/cli/examples/design-fink.json']);
    expect(r.code).toBe(0);
    const out = json(r.stdout) as {
      units: { length: string; force: string };
      ok: boolean;
      span: { value: number; text: string };
      pieces: { lumber: string }[];
      cautions: string[];
      engineVersion: string;
    };
    expect(out.units).toMatchObject({ length: 'in', force: 'lbf' });
    expect(out.span).toEqual({ value: 288, text: `24'-0"` });
    expect(out.ok).toBe(true);
    expect(out.pieces.every((p) => p.lumber.startsWith('2x4'))).toBe(true);
    expect(out.cautions).toHaveLength(5);
    expect(out.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
  });

  it('reads - from standard input', () => {
    const model = {
      joints: [
        { id: 'A', x: 0, y: 0 },
        { id: 'B', x: 2, y: 0 },
        { id: 'C', x: 1, y: 1 },
      ],
      members: [
        { from: 'A', to: 'B' },
        { from: 'B', to: 'C' },
        { from: 'A', to: 'C' },
      ],
      supports: [
        { joint: 'A', type: 'pin' },
        { joint: 'B', type: 'roller' },
      ],
      loads: [{ joint: 'C', fy: -10 }],
    };
    const r = run(['analyze', '-'], JSON.stringify(model));
    expect(r.code).toBe(0);
    // Closed form: symmetric triangle, each support takes 5; each rafter carries 5/sin45° C.
    const out = json(r.stdout) as { members: { id: string; force: number }[] };
    expect(out.members.find((m) => m.id === 'AC')!.force).toBeWithin(-5 * Math.SQRT2, {
      rel: 1e-9,
    });
  });

  it('bad JSON, a missing file and a bad shape are `invalid`', () => {
    expectError(run(['analyze', '-'], '{ not json'), 'invalid');
    expectError(run(['design', 'server/cli/examples/nope.json']), 'invalid');
    const e = expectError(run(['design', '-'], JSON.stringify({ units: 'imperial' })), 'invalid');
    expect(e.message).toMatch(/span: Span must be a number/);
  });

  it('engine refusals keep their code: unstable, indeterminate, geometry', () => {
    const square = {
      joints: [
        { id: 'A', x: 0, y: 0 },
        { id: 'B', x: 1, y: 0 },
        { id: 'C', x: 1, y: 1 },
        { id: 'D', x: 0, y: 1 },
      ],
      members: [
        { from: 'A', to: 'B' },
        { from: 'B', to: 'C' },
        { from: 'C', to: 'D' },
        { from: 'D', to: 'A' },
      ],
      supports: [
        { joint: 'A', type: 'pin' },
        { joint: 'B', type: 'roller' },
      ],
    };
    expectError(run(['analyze', '-'], JSON.stringify(square)), 'unstable');
    const braced = {
      ...square,
      members: [...square.members, { from: 'A', to: 'C' }, { from: 'B', to: 'D' }],
    };
    expectError(run(['analyze', '-'], JSON.stringify(braced)), 'indeterminate');
    const tooLong = {
      units: 'imperial',
      profile: 'kingPost',
      span: 60 * 12,
      pitch: 4,
      maxStockLength: 96,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    };
    expectError(run(['design', '-'], JSON.stringify(tooLong)), 'geometry');
  });

  it('--help and no arguments explain both formats; unknown commands are refused', () => {
    for (const args of [['--help'], []]) {
      const r = run(args);
      expect(r.code).toBe(0);
      expect(r.stdout).toMatch(/analyze FILE\.json/);
      expect(r.stdout).toMatch(/design FILE\.json/);
      expect(r.stdout).toMatch(/exit code 2/i);
    }
    expectError(run(['solve', 'x.json']), 'invalid');
  });
});
