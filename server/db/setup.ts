/**
 * `node --import tsx server/db/setup.ts`: apply migrations, then seed the demo workshop
 * (idempotent: running it again changes nothing). Used by `npm start`.
 */
import { loadConfig } from '../config.ts';
import { createSequelize } from './sequelize.ts';
import { migrate } from './migrate.ts';
import { seedDemo } from './seed.ts';

const config = loadConfig();
const sequelize = createSequelize(config.databaseUrl, config.dbTimeoutMs);
try {
  const applied = await migrate(sequelize);
  if (applied.length) console.log(`[db] applied migrations: ${applied.join(', ')}`);
  const seeded = await seedDemo(sequelize);
  console.log(seeded ? '[db] seeded the demo workshop' : '[db] demo workshop already present');
} finally {
  await sequelize.close();
}
