import { describe, expect, it } from 'vitest';
import { validateModel, type TrussModel } from '../../../../shared/engine/analysis';
import { engineErrorOf } from './support/errors';
import { kingPost } from './support/layouts';

const base = (): TrussModel => ({ ...kingPost(6000, 2000), loads: [{ joint: 'U1', fy: -1000 }] });

const kindsOf = (model: TrussModel) => {
  const e = engineErrorOf(() => validateModel(model));
  expect(e.code).toBe('invalid');
  return (e.details!.issues as { kind: string; ids: string[] }[]).map((i) => i.kind);
};

describe('validateModel', () => {
  it('accepts a sound model', () => {
    expect(() => validateModel(base())).not.toThrow();
  });

  const cases: [string, (m: TrussModel) => void, string][] = [
    ['unknown joint in a member', (m) => (m.members[0].to = 'Q'), 'unknown_joint'],
    ['unknown joint in a support', (m) => (m.supports[1].joint = 'Q'), 'unknown_joint'],
    ['unknown joint in a load', (m) => (m.loads![0].joint = 'Q'), 'unknown_joint'],
    ['duplicate joint id', (m) => m.joints.push({ id: 'L1', x: 99, y: 99 }), 'duplicate_joint'],
    ['duplicate member id', (m) => m.members.push({ from: 'L0', to: 'L1' }), 'duplicate_member'],
    ['duplicate explicit member id', (m) => (m.members[1].id = 'L0L1'), 'duplicate_member'],
    ['member to itself', (m) => m.members.push({ from: 'L1', to: 'L1' }), 'self_member'],
    ['non-finite x', (m) => (m.joints[2].x = NaN), 'non_finite'],
    ['non-finite y', (m) => (m.joints[2].y = Infinity), 'non_finite'],
    ['non-finite ea', (m) => (m.members[0].ea = NaN), 'non_finite'],
    ['non-positive ea', (m) => (m.members[0].ea = 0), 'non_positive_ea'],
    ['non-finite load', (m) => (m.loads![0].fy = NaN), 'non_finite'],
    ['no supports', (m) => (m.supports = []), 'no_supports'],
    ['support twice', (m) => m.supports.push({ joint: 'L0', type: 'roller' }), 'duplicate_support'],
    ['no joints', (m) => (m.joints = []), 'no_joints'],
    [
      'unknown support type',
      (m) => (m.supports[0] = { joint: 'L0', type: 'fixed' as 'pin' }),
      'bad_support',
    ],
  ];
  for (const [name, spoil, kind] of cases) {
    it(`rejects ${name}`, () => {
      const model = base();
      spoil(model);
      expect(kindsOf(model)).toContain(kind);
    });
  }

  it('rejects coincident joints and the zero-length member between them', () => {
    const model = base();
    // Within TOLERANCE (1e-9) of the 6000 mm model size.
    model.joints.push({ id: 'X', x: 3000 + 1e-9, y: 0 });
    model.members.push({ from: 'L1', to: 'X' }, { from: 'X', to: 'U1' });
    const e = engineErrorOf(() => validateModel(model));
    const issues = e.details!.issues as { kind: string; ids: string[] }[];
    expect(issues).toContainEqual(
      expect.objectContaining({ kind: 'coincident_joints', ids: ['L1', 'X'] }),
    );
    expect(issues).toContainEqual(
      expect.objectContaining({ kind: 'zero_length_member', ids: ['L1X'] }),
    );
    expect(e.message).toMatch(/joints "L1" and "X" are at the same point/);
  });

  it('keeps joints a small but real distance apart', () => {
    const model = base();
    model.joints.push({ id: 'X', x: 3000 + 1e-3, y: 0 });
    model.members.push({ from: 'L1', to: 'X' }, { from: 'X', to: 'U1' });
    expect(() => validateModel(model)).not.toThrow();
  });

  it('reports every issue at once with a readable message', () => {
    const model = base();
    model.members[0].to = 'Q';
    model.joints[3].y = NaN;
    const e = engineErrorOf(() => validateModel(model));
    expect(e.message).toMatch(/^Invalid truss model: /);
    expect(e.message).toContain('member "L0Q" refers to unknown joint "Q"');
    expect(e.message).toContain('joint "U1" has coordinates (3000, NaN)');
  });
});
