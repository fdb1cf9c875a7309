import { defineConfig } from 'drizzle-kit';

// Migrations are generated from the schema with `npm run db:generate`; they are applied at start
// by server/db/migrate.ts, so drizzle-kit never needs a live database here.
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema/index.ts',
  out: './drizzle',
  casing: 'snake_case',
});
