import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

/** `truss cut` as a user runs it: a child process, JSON on stdout, exit codes. */
const run = (args: string[], stdin?: string) => {
  const r = spawnSync('npx', ['tsx', 'server/cli/truss.ts', ...args], {
    cwd: process.cwd(),
    input: stdin,
    encoding: 'utf8',
    timeout: 90000,
  });
  return { code: r.status, stdout: r.stdout };
};

interface CutOutput {
  boards: { stock: number; pieces: number[]; offcut: number }[];
  boardCount: number;
  totalCost: number;
  lowerBound: { cost: number };
  optimal: boolean;
}

describe('truss cut', { timeout: 240_000 }, () => {
  it('GAMS model library cutstock example: 453 rolls of 100, proven optimal (cost = length)', () => {
    const r = run(['cut', 'server/cli/examples/cut-gams.json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as CutOutput;
    expect(Object.keys(out)).toEqual([
      'boards',
      'boardCount',
      'totalCost',
      'lowerBound',
      'optimal',
    ]);
    expect(out.boardCount).toBe(453);
    expect(out.totalCost).toBe(45300);
    expect(out.lowerBound).toEqual({ cost: 45300 });
    expect(out.optimal).toBe(true);
    expect(out.boards[0]).toEqual({
      stock: 100,
      pieces: expect.any(Array),
      offcut: expect.any(Number),
    });
  });

  it('the lumber example (kerf, trim, prices, stock on hand) is feasible and within its bound', () => {
    const file = 'server/cli/examples/cut-lumber.json';
    const input = JSON.parse(readFileSync(file, 'utf8')) as {
      stocks: { length: number; cost: number; available?: number }[];
      kerf: number;
      trim: number;
      pieces: { length: number; quantity: number }[];
    };
    const r = run(['cut', '-'], readFileSync(file, 'utf8'));
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as CutOutput;
    const used = new Map<number, number>();
    for (const b of out.boards) {
      const total =
        b.pieces.reduce((s, p) => s + p, 0) + (b.pieces.length - 1) * input.kerf + input.trim;
      expect(total).toBeLessThanOrEqual(b.stock + 1e-9);
      expect(b.offcut).toBeCloseTo(b.stock - total, 9);
      used.set(b.stock, (used.get(b.stock) ?? 0) + 1);
    }
    for (const s of input.stocks)
      if (s.available !== undefined)
        expect(used.get(s.length) ?? 0).toBeLessThanOrEqual(s.available);
    const cut = out.boards.flatMap((b) => b.pieces).sort((a, b) => a - b);
    const wanted = input.pieces
      .flatMap((p) => Array<number>(p.quantity).fill(p.length))
      .sort((a, b) => a - b);
    expect(cut).toEqual(wanted);
    expect(out.totalCost).toBeGreaterThanOrEqual(out.lowerBound.cost - 1e-9);
  });

  it('exits 2 with a clear error for a piece longer than every stock and for too little stock on hand', () => {
    const tooLong = run(
      ['cut', '-'],
      JSON.stringify({ stocks: [{ length: 96 }], pieces: [{ length: 97, quantity: 1 }] }),
    );
    expect(tooLong.code).toBe(2);
    expect(JSON.parse(tooLong.stdout).error).toMatchObject({
      code: 'piece_too_long',
      message: expect.stringMatching(/longer than every stock/),
    });
    const short = run(
      ['cut', '-'],
      JSON.stringify({
        stocks: [{ length: 100, available: 2 }],
        pieces: [{ length: 60, quantity: 3 }],
      }),
    );
    expect(short.code).toBe(2);
    expect(JSON.parse(short.stdout).error).toMatchObject({
      code: 'not_enough_stock',
      message: expect.stringMatching(/on hand/),
    });
    const bad = run(
      ['cut', '-'],
      JSON.stringify({ stocks: [], pieces: [{ length: 1, quantity: 1 }] }),
    );
    expect(bad.code).toBe(2);
    expect(JSON.parse(bad.stdout).error.code).toBe('invalid');
  });
});
