import { writeFileSync } from 'node:fs';
import { computeDesign } from './server/services/design';
import { lumberPlanFor } from './server/services/lumberPlan';
import { renderLumberPlanPdf } from './server/services/lumberPlanPdf';
import { DEMO_STOCK_SETTINGS } from './shared/api/stock';
const mk = (mark: string, design: any, quantity: number) => { const d = computeDesign(design, { plies: 1 }); return { mark, quantity, plies: 1, designInput: d.input, designResult: d.result } as any; };
const lines = [
  mk('T1', { units: 'imperial', profile: 'fink', span: 288, pitch: 4, heelHeight: 0, overhang: 12, spacing: 24, loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 } }, 14),
  mk('T2', { units: 'imperial', profile: 'howe', span: 336, pitch: 6, heelHeight: 4, overhang: 18, spacing: 24, loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 } }, 9),
];
const plan = await lumberPlanFor({ id: 1, number: 'Q-1042' } as any, lines, { settings: DEMO_STOCK_SETTINGS, demo: true });
writeFileSync('/tmp/plan.json', JSON.stringify(plan, null, 1));
writeFileSync('/tmp/plan.pdf', await renderLumberPlanPdf(plan, { plantName: 'Cedar Ridge Truss Works' }));
