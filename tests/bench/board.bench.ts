/**
 * Schedule board benchmark (`npm run bench`): the built client's board (`/schedule`) in headless
 * Chromium at the foreman's 1024 × 768, showing 300 planned orders over 10 weeks on 4 tables (the
 * scheduler benchmark's workload) — every working day of the ten weeks on the board, and the load
 * chart. The API is answered from the page's network layer (no server or database in the timing).
 * Reports the time from navigation to the last block on screen, and the main thread's long tasks
 * (over 50 ms, counted by a PerformanceObserver from the first script on): what a user feels as jank.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import express from 'express';
import type { BrowserContext, Page } from 'playwright-core';
import type { Schedule } from '../../shared/api/production';
import { planSchedule, workingDates } from '../../shared/engine/schedule';
import { launchBrowser } from '../support/browser';
import { benchInput } from './scheduleWorkload';

// `BENCH_CLIENT=dir` measures another build (say, main's) back to back with this one.
const CLIENT = process.env.BENCH_CLIENT ?? 'dist/client';

interface Result {
  rendered: number;
  longTasks: number[];
  script: number;
  layout: number;
  /** CPU time of the page's main-thread tasks, ms: what the page asked of a core, load aside. */
  cpuTasks: number[];
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

function report(what: string, grid: Schedule, results: Result[]) {
  const longest = results.map((r) => Math.max(0, ...r.longTasks));
  const total = results.map((r) => r.longTasks.reduce((s, d) => s + d, 0));
  const cpuLongest = results.map((r) => Math.max(0, ...r.cpuTasks));
  console.log(
    `board (${what}): ${grid.orders.length} orders, ${grid.blocks.length} blocks, ` +
      `${grid.tables.length} tables × ${grid.days.length} working days, 1024×768 headless Chromium: ` +
      `rendered in median ${median(results.map((r) => r.rendered)).toFixed(0)} ms from navigation; ` +
      `long tasks (> 50 ms) per load: median ${median(results.map((r) => r.longTasks.length))}, ` +
      `longest median ${median(longest).toFixed(0)} ms, total median ${median(total).toFixed(0)} ms; ` +
      `main thread median ${median(results.map((r) => r.script)).toFixed(0)} ms script, ` +
      `${median(results.map((r) => r.layout)).toFixed(0)} ms style and layout; ` +
      `tasks' own CPU time (the machine's load aside): longest median ${median(cpuLongest).toFixed(0)} ms, ` +
      `over 50 ms median ${median(results.map((r) => r.cpuTasks.filter((d) => d > 50).length))}, ` +
      `total median ${median(results.map((r) => r.cpuTasks.reduce((s, d) => s + d, 0))).toFixed(0)} ms ` +
      `(${RUNS} loads; machine load average ${loadavg()[0].toFixed(1)} on ${cpus().length} cores)`,
  );
}
const RUNS = 3;

type Cdp = Awaited<ReturnType<BrowserContext['newCDPSession']>>;
interface TraceEvent {
  name: string;
  ph: string;
  pid: number;
  tid: number;
  dur?: number;
  tdur?: number;
  args?: { name?: string };
}

/**
 * Stops the page's trace and returns the CPU time (thread time) of each top-level task on its
 * main thread, in ms. On a machine shared with other work a task's wall time includes the time it
 * waited for a core; its thread time does not.
 */
async function taskCpuTimes(cdp: Cdp): Promise<number[]> {
  const done = new Promise<string>((resolve) =>
    cdp.once('Tracing.tracingComplete', (e) => resolve(e.stream!)),
  );
  await cdp.send('Tracing.end');
  const stream = await done;
  let text = '';
  for (;;) {
    const chunk = await cdp.send('IO.read', { handle: stream });
    text += chunk.base64Encoded ? Buffer.from(chunk.data, 'base64').toString() : chunk.data;
    if (chunk.eof) break;
  }
  await cdp.send('IO.close', { handle: stream });
  const events = (JSON.parse(text) as { traceEvents: TraceEvent[] }).traceEvents;
  const tasks = new Map<string, number[]>();
  const mains = new Set(
    events
      .filter((e) => e.ph === 'M' && e.name === 'thread_name' && e.args?.name === 'CrRendererMain')
      .map((e) => `${e.pid}|${e.tid}`),
  );
  for (const e of events) {
    const k = `${e.pid}|${e.tid}`;
    if (e.ph !== 'X' || e.name !== 'ThreadControllerImpl::RunTask' || !mains.has(k)) continue;
    tasks.set(k, [...(tasks.get(k) ?? []), (e.tdur ?? 0) / 1000]);
  }
  // The page's renderer is the one that did the most.
  const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
  return [...tasks.values()].sort((a, b) => sum(b) - sum(a))[0] ?? [];
}

/**
 * Resolves with the page's clock once `test` (a script expression) holds, checked once a frame. A
 * string, not a function: the runner's compiled helpers do not exist in the page.
 */
const waitInPage = (page: Page, test: string) =>
  page.evaluate(`new Promise((resolve, reject) => {
    const check = () => (${test}) ? resolve(performance.now())
      : performance.now() > 180000 ? reject(new Error('Not shown: ${test.replace(/'/g, '"')}'))
      : requestAnimationFrame(check);
    check();
  })`) as Promise<number>;

/** The board as `GET /api/schedule` presents it, for the whole plan. */
function boardOf(): Schedule {
  const input = benchInput();
  const plan = planSchedule(input);
  const days = workingDates(input.start, input.horizonDays, input.calendar);
  const blocks = new Map<string, Schedule['blocks'][number]>();
  const minutes = new Map<number, number>();
  for (const p of plan.placements) {
    const k = `${p.orderId}|${p.tableId}|${p.date}`;
    const b = blocks.get(k) ?? {
      orderId: p.orderId,
      number: `SO-${String(p.orderId).padStart(5, '0')}`,
      customer: `Builder ${p.orderId % 37}`,
      tableId: p.tableId,
      date: p.date,
      minutes: 0,
      trusses: 0,
      marks: [],
      pinned: p.pinned,
    };
    b.minutes += p.minutes;
    b.trusses += p.quantity;
    if (!b.marks.includes(p.mark)) b.marks.push(p.mark);
    blocks.set(k, b);
    minutes.set(p.orderId, (minutes.get(p.orderId) ?? 0) + p.minutes);
  }
  return {
    from: input.start,
    days,
    tables: input.tables.map((t) => ({ ...t, capacity: t.crew * t.shifts * t.hoursPerShift * 60 })),
    load: plan.load.filter((l) => days.includes(l.date)),
    blocks: [...blocks.values()],
    orders: plan.orders.map((o) => ({
      id: o.orderId,
      number: `SO-${String(o.orderId).padStart(5, '0')}`,
      customer: `Builder ${o.orderId % 37}`,
      status: 'released',
      promisedOn: o.promisedOn,
      plannedFinishOn: o.canMakeOn,
      late: o.late,
      minutes: minutes.get(o.orderId) ?? 0,
      version: 1,
    })),
    ready: [],
    held: [],
  };
}

const ME = {
  user: { id: 1, email: 'foreman@example.test', name: 'Bench Foreman', role: 'foreman' },
  plant: { id: 1, name: 'Bench Plant', units: 'imperial', demo: false },
  customer: null,
};

async function main() {
  if (!existsSync(join(CLIENT, 'index.html')))
    execFileSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' });
  const board = boardOf();
  // As the app shows it: the first two weeks on the grid (`days=10`), ten weeks in the chart.
  const twoWeeks = new Set(board.days.slice(0, 10));
  const first: Schedule = {
    ...board,
    days: board.days.slice(0, 10),
    load: board.load.filter((l) => twoWeeks.has(l.date)),
    blocks: board.blocks.filter((b) => twoWeeks.has(b.date)),
  };
  const me = { ...ME, user: { ...ME.user, plantId: 1, customerId: null } };
  const app = express();
  app.use(express.static(CLIENT, { index: false }));
  app.use((_req, res) => res.sendFile(join(process.cwd(), CLIENT, 'index.html')));
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const { browser, close } = await launchBrowser();
  const measure = async (grid: Schedule) => {
    const results: Result[] = [];
    for (let run = 0; run <= RUNS; run++) {
      const page = await browser.newPage();
      await page.setViewportSize({ width: 1024, height: 768 });
      await page.addInitScript(() => {
        const w = window as unknown as { __long: number[] };
        w.__long = [];
        new PerformanceObserver((list) => {
          for (const e of list.getEntries()) w.__long.push(e.duration);
        }).observe({ type: 'longtask', buffered: true });
      });
      await page.route('**/api/**', (route) => {
        const path = new URL(route.request().url()).pathname;
        const json = (body: unknown, status = 200) =>
          route.fulfill({ status, contentType: 'application/json', body: JSON.stringify(body) });
        if (path === '/api/auth/me') return json(me);
        if (path === '/api/auth/csrf') return json({ token: 'bench' });
        if (path === '/api/schedule')
          return json(
            new URL(route.request().url()).searchParams.get('days') === '10' ? grid : board,
          );
        return json({ error: { code: 'not_found', message: 'Not in the benchmark.' } }, 404);
      });
      const cdp = await browser.newCDPSession(page);
      await cdp.send('Performance.enable');
      await cdp.send('Tracing.start', {
        categories: 'toplevel',
        transferMode: 'ReturnAsStream',
      });
      await page.goto(`${base}/schedule`);
      // Waited for inside the page, one cheap query a frame: Playwright's own selector engine
      // (text matching over the whole board, its injected script) would add long tasks of its own.
      const rendered = await waitInPage(
        page,
        `document.querySelectorAll('[data-testid^="block-"]').length === ${grid.blocks.length}`,
      );
      // Let the chart and any trailing work finish, then read the long tasks.
      await waitInPage(page, `document.querySelector('.recharts-bar-rectangle')`);
      await page.waitForTimeout(500);
      const longTasks = await page.evaluate(
        () => (window as unknown as { __long: number[] }).__long,
      );
      // Main-thread time by kind since the page opened: script, and style with layout.
      const { metrics } = await cdp.send('Performance.getMetrics');
      const m = (name: string) => 1000 * (metrics.find((x) => x.name === name)?.value ?? 0);
      const script = m('ScriptDuration');
      const layout = m('LayoutDuration') + m('RecalcStyleDuration');
      const cpuTasks = await taskCpuTimes(cdp);
      await page.close();
      // The first run warms the disk cache.
      if (run > 0) results.push({ rendered, longTasks, script, layout, cpuTasks });
    }
    return results;
  };
  try {
    report('two weeks on the grid as the app shows it', first, await measure(first));
    report('all ten weeks on the grid', board, await measure(board));
  } finally {
    await close();
    server.close();
  }
}

void main();
