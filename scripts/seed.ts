import { getDb, dbReady } from '../src/server/db/index';
import { seedDemo } from './seed-demo';

await dbReady();
const r = await seedDemo(getDb());
console.log(r.created ? 'Demo data seeded.' : 'Demo data already present; nothing changed.');
