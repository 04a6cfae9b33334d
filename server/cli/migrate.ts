/** `npm run migration:run`: applies pending migrations to DATABASE_URL. */
import { connectAndMigrate, createDataSource } from '../data-source';

const url = process.env['DATABASE_URL'];
if (!url) {
  console.error('DATABASE_URL is required, e.g. DATABASE_URL=postgres://user:pw@127.0.0.1:5432/conewise');
  process.exit(2);
}
const dataSource = createDataSource({ url });
const applied = await connectAndMigrate(dataSource);
console.log(applied.length ? `applied: ${applied.join(', ')}` : 'nothing to apply');
await dataSource.destroy();
