/** npm run db:migrate | db:rollback | db:seed — against DATABASE_URL or the project's own cluster. */
import { connect } from '../server/db/sequelize';
import { migrator } from '../server/db/migrator';
import { seedDemo } from '../seeders/demo';
import { provideAppDatabase } from './database';

const action = process.argv[2];
const db = await provideAppDatabase();
const sequelize = connect(db.url);
try {
  const m = migrator(sequelize);
  if (action === 'migrate')
    console.log(
      'Applied:',
      (await m.up()).map((x) => x.name),
    );
  else if (action === 'rollback')
    console.log(
      'Rolled back:',
      (await m.down()).map((x) => x.name),
    );
  else if (action === 'seed') await seedDemo().then(() => console.log('Demo data seeded.'));
  else throw new Error('usage: tsx scripts/db.ts migrate|rollback|seed');
} finally {
  await sequelize.close();
  db.stop();
}
