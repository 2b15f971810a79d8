import { openAndMigrate } from '../boot';
import { loadConfigOrExit } from '../config/env';
import { seedDemo } from '../demo/seed';

/** `npm run seed:demo`: loads the demo scenario into DATA_DIR's database; running it twice changes nothing. */
const config = loadConfigOrExit();
const { sequelize } = await openAndMigrate(config);
await seedDemo(sequelize);
await sequelize.close();
console.log(
  `Demo data is in ${config.dataDir}. Sign in as ned@saltmarsh-guild.test with the password tickwright-demo.`,
);
