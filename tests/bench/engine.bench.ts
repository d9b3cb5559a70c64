/**
 * Engine benchmark (`npm run bench`; a script, not a vitest test). Prints median and p95 of:
 * analysing a 30-joint truss (a 14-panel flat truss: 30 joints, 57 members) for one load case,
 * and the full design (all combinations, auto-sizing, deflection, plates) of a 10-panel flat
 * truss and of a double Fink (6 top and 5 bottom panels). Demo loads.
 */
import { analyzeTruss, type TrussModel } from '../../shared/engine/analysis';
import { designInputSchema, toEngineInput, type DesignInputDraft } from '../../shared/api/design';
import { designTruss } from '../../shared/engine/design';
import { generateProfile } from '../../shared/engine/profiles';
import { inchToMm, inch } from '../../shared/engine/units';

interface Stats {
  median: number;
  p95: number;
  runs: number;
}

/** Times `fn` for about `budgetMs` after a warm-up, in microseconds per call. */
function measure(fn: () => unknown, budgetMs = 2000): Stats {
  for (let i = 0; i < 300; i++) fn();
  const samples: number[] = [];
  const end = performance.now() + budgetMs;
  while (performance.now() < end) {
    const t0 = performance.now();
    fn();
    samples.push((performance.now() - t0) * 1000);
  }
  samples.sort((a, b) => a - b);
  const at = (q: number) => samples[Math.min(samples.length - 1, Math.floor(q * samples.length))];
  return { median: at(0.5), p95: at(0.95), runs: samples.length };
}

function thirtyJointTruss(): TrussModel {
  const profile = generateProfile({
    kind: 'flat',
    span: inchToMm(inch(40 * 12)),
    pitch: 0,
    heelHeight: 0,
    overhangLeft: 0,
    overhangRight: 0,
    depth: inchToMm(inch(36)),
    panels: 14,
  });
  return {
    joints: profile.joints,
    members: profile.members.map((m) => ({ from: m.from, to: m.to })),
    supports: profile.supports,
    loads: profile.topChordJoints.map((joint) => ({ joint, fy: -2000 })),
  };
}

const loads = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10, bcllNonConcurrent: 10 };
const flatTen: DesignInputDraft = {
  units: 'imperial',
  profile: 'flat',
  span: 30 * 12,
  depth: 30,
  panels: 10,
  spacing: 24,
  loads: { ...loads, snow: { pg: 30 } },
};
const doubleFink: DesignInputDraft = {
  units: 'imperial',
  profile: 'doubleFink',
  span: 40 * 12,
  pitch: 6,
  heelHeight: 4,
  overhang: 18,
  spacing: 24,
  loads: { ...loads, snow: { pg: 30 }, windUplift: 15 },
};

const fmt = (s: Stats) =>
  `median ${s.median.toFixed(0).padStart(5)} µs   p95 ${s.p95.toFixed(0).padStart(5)} µs   (${s.runs} runs)`;

const model = thirtyJointTruss();
console.log(`Node ${process.version}, ${process.platform}/${process.arch}`);
console.log(
  `generate profile → line model, 14-panel flat truss:  ${fmt(measure(() => thirtyJointTruss()))}`,
);
console.log(
  `analyse, 30-joint flat truss (${model.members.length} members):  ${fmt(measure(() => analyzeTruss(model)))}`,
);
for (const [name, draft] of [
  ['design, 10-panel flat truss', flatTen],
  ['design, double Fink (11 panels)', doubleFink],
] as const) {
  const input = toEngineInput(designInputSchema.parse(draft));
  const d = designTruss(input);
  console.log(
    `${name} (${d.members.length} members, ${d.combinations.length} combinations, ok ${d.ok}):  ` +
      fmt(measure(() => designTruss(input))),
  );
}
