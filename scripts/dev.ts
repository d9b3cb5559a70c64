/** npm run dev: the database, migrations, the API restarting on change (tsx watch) and Vite with HMR. */
import { spawn } from 'node:child_process';
import { connect } from '../server/db/sequelize';
import { migrator } from '../server/db/migrator';
import { User } from '../server/models';
import { seedDemo } from '../seeders/demo';
import { provideAppDatabase } from './database';

const db = await provideAppDatabase();
const sequelize = connect(db.url);
await migrator(sequelize).up();
if ((await User.count()) === 0) await seedDemo();
await sequelize.close();

const env = { ...process.env, DATABASE_URL: db.url, PORT: '3001', API_PORT: '3001' };
const api = spawn('npx', ['tsx', 'watch', '--clear-screen=false', 'server/main.ts'], {
  stdio: 'inherit',
  env,
});
const web = spawn('npx', ['vite'], { stdio: 'inherit', env });
console.log('Open http://127.0.0.1:5173 (API on :3001).');
const stop = () => {
  api.kill('SIGTERM');
  web.kill('SIGTERM');
  db.stop();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
