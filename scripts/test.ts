/**
 * npm test: a throwaway PostgreSQL of its own (.data/test-postgres, port 54339, fresh database each
 * run, migrations applied), then typecheck, lint, client build, and every vitest project (unit,
 * integration against that database, browser). Exits non-zero on any failure.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { connect } from '../server/db/sequelize';
import { migrator } from '../server/db/migrator';
import { provideDatabase, TEST_PG_PORT } from './database';
import { ensureTestTools } from './tools';

const only = process.argv.slice(2); // e.g. `npm test -- tests/server` passes filters to vitest
ensureTestTools(); // chromium, calculix-ccx, poppler-utils: installed as root, else the command

const db = await provideDatabase({
  dir: '.data/test-postgres',
  port: TEST_PG_PORT,
  name: 'spanwise_test',
  fresh: true,
  useEnv: false,
});
const sequelize = connect(db.url);
await migrator(sequelize).up();
await sequelize.close();

const env = { ...process.env, TEST_DATABASE_URL: db.url, NODE_ENV: 'test' };
const steps: [string, string[]][] = only.length
  ? []
  : [
      ['typecheck', ['tsc', '--noEmit', '-p', 'tsconfig.json']],
      ['lint', ['eslint', '.', '--max-warnings', '0']],
      ['build', ['vite', 'build', '--logLevel', 'warn']],
    ];
const failed: string[] = [];
for (const [name, cmd] of steps) {
  console.log(`\n▶ ${name}: ${cmd.join(' ')}`);
  const r = spawnSync('npx', cmd, { stdio: 'inherit', env });
  if (r.status !== 0) failed.push(name);
}

mkdirSync('test-results', { recursive: true });
console.log('\n▶ tests: vitest run');
const report = 'test-results/vitest.json';
const r = spawnSync(
  'npx',
  [
    'vitest',
    'run',
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${report}`,
    ...only,
  ],
  { stdio: 'inherit', env },
);
if (r.status !== 0) failed.push('tests');
db.stop();

let passed = 0;
let failedTests = 0;
let skipped = 0;
if (existsSync(report)) {
  const j = JSON.parse(readFileSync(report, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
    numTodoTests: number;
  };
  passed = j.numPassedTests;
  failedTests = j.numFailedTests;
  skipped = j.numPendingTests + j.numTodoTests;
}
if (failed.length) console.log(`\nFailed steps: ${failed.join(', ')}`);
console.log(
  `\n${passed} passed, ${failedTests + (failed.length && !failedTests ? failed.length : 0)} failed, ${skipped} skipped`,
);
process.exit(failed.length ? 1 : 0);
