/**
 * Client bundle benchmark (`npm run bench`; a script, not a test): builds the client with Vite into
 * a temporary folder and adds up the gzipped JavaScript each first visit downloads — the entry
 * chunk and everything it imports, plus the lazy route chunk of the page and its imports (what
 * the browser fetches before the page can render). Goal: the builder portal's first load (its
 * home) under 120 KB; the script fails above it. Also names the packages on the portal's path, and
 * fails if a desk-only one (or zod's classic API: the portal's schemas are zod/mini) is among them.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { build, type Manifest, type Plugin } from 'vite';

const outDir = mkdtempSync(join(tmpdir(), 'spanwise-bundle-'));
/** Which source modules (and how many bytes of each) ended up in which output file. */
const modulesOf = new Map<string, Map<string, number>>();
const record: Plugin = {
  name: 'record-modules',
  generateBundle(_options, bundle) {
    for (const chunk of Object.values(bundle)) {
      if (chunk.type !== 'chunk') continue;
      const byModule = new Map<string, number>();
      for (const [id, m] of Object.entries(chunk.modules)) byModule.set(id, m.renderedLength);
      modulesOf.set(chunk.fileName, byModule);
    }
  },
};

await build({
  logLevel: 'warn',
  build: { outDir, emptyOutDir: true, manifest: true },
  plugins: [record],
});
const manifest = JSON.parse(readFileSync(join(outDir, '.vite/manifest.json'), 'utf8')) as Manifest;

/** The output files a manifest entry needs before it runs (itself and its static imports). */
function closure(key: string, into = new Set<string>()) {
  const entry = manifest[key];
  if (!entry) throw new Error(`No chunk for ${key} in the build (renamed?)`);
  if (into.has(entry.file)) return into;
  into.add(entry.file);
  for (const k of entry.imports ?? []) closure(k, into);
  return into;
}
const gz = (file: string) => gzipSync(readFileSync(join(outDir, file)), { level: 9 }).length;
const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;
const total = (files: Set<string>) => [...files].reduce((s, f) => s + gz(f), 0);
const union = (...sets: Set<string>[]) => new Set(sets.flatMap((s) => [...s]));

const ENTRY = 'index.html';
const entry = closure(ENTRY);
const route = (src: string) => union(entry, closure(src));
const HOME = 'src/features/portal/components/PortalHome.tsx';
const PORTAL_PAGES = 'src/app/portal-pages.tsx';
const SIGN_IN = 'src/features/auth/components/SignInPage.tsx';
/** The portal's first load (a builder signing in lands on its home), held to the goal. */
const portalPaths: [string, Set<string>][] = [
  ['Builder opens the portal, signed in (home)', route(HOME)],
];
const paths: [string, Set<string>][] = [
  ['Entry alone (app shell, router, libraries every page needs)', entry],
  ['Sign-in page', route(SIGN_IN)],
  ...portalPaths,
  // Reported, not held to the goal: zod's shared core (the desk's classic schemas use it too) and
  // the truss drawing come with these pages.
  ['Builder opens an order or a quote first (e-mail link)', route(PORTAL_PAGES)],
  ['Builder from a cold cache: sign-in, then the portal home', union(route(SIGN_IN), route(HOME))],
  ['Desk: an order page (for comparison)', route('src/app/desk-pages.tsx')],
];
/** The goal for a builder's first load on a phone. */
const GOAL_BYTES = 120 * 1024;

console.log('Gzipped JavaScript of a first visit (zlib level 9):');
for (const [label, files] of paths)
  console.log(`  ${label}: ${kb(total(files))} in ${files.size} files`);

/** npm package (or source folder) of a module id. */
function packageOf(id: string) {
  const i = id.lastIndexOf('node_modules/');
  if (i < 0) return id.replace(`${process.cwd()}/`, '').split('/').slice(0, 3).join('/');
  const parts = id.slice(i + 'node_modules/'.length).split('/');
  return parts[0]!.startsWith('@') ? `${parts[0]}/${parts[1]}` : parts[0]!;
}
const portal = union(route(HOME), route(PORTAL_PAGES));
const sizes = new Map<string, number>();
for (const file of portal)
  for (const [id, bytes] of modulesOf.get(file) ?? [])
    sizes.set(packageOf(id), (sizes.get(packageOf(id)) ?? 0) + bytes);
console.log('Largest parts of the portal’s path (bytes before minifying):');
for (const [name, bytes] of [...sizes].sort((a, b) => b[1] - a[1]).slice(0, 12))
  console.log(`  ${name}: ${kb(bytes)}`);

// Desk-only code that must stay off the builder's phone (route tables may name desk pages).
const DESK_ONLY = [
  'node_modules/recharts/',
  'node_modules/@dnd-kit/',
  'node_modules/react-hook-form/',
  'node_modules/@tanstack/table-core/',
  'shared/engine/design/',
  'shared/engine/frame/',
  'src/features/truss-editor/components/',
  'src/features/schedule/components/',
  'src/app/desk-pages.tsx',
  'src/app/router.tsx',
  'node_modules/zod/v4/classic/',
];
const portalModules = [...portal].flatMap((file) => [...(modulesOf.get(file)?.keys() ?? [])]);
const leaked = DESK_ONLY.filter((part) => portalModules.some((id) => id.includes(part)));
const over = portalPaths.filter(([, files]) => total(files) > GOAL_BYTES);
for (const [label, files] of over) {
  console.error(`${label}: ${kb(total(files))}, over the goal of ${kb(GOAL_BYTES)}`);
  process.exitCode = 1;
}
if (!over.length) console.log(`The portal's first load is under the goal of ${kb(GOAL_BYTES)}.`);
rmSync(outDir, { recursive: true, force: true });
if (leaked.length) {
  console.error(`Desk-only code on the portal's path: ${leaked.join(', ')}`);
  process.exitCode = 1;
} else
  console.log(`None of ${DESK_ONLY.length} desk-only libraries and pages is on the portal's path.`);
