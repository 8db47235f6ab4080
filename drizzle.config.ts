import { defineConfig } from 'drizzle-kit';

// Only `generate` is used: push/pull misread MariaDB's JSON columns (see DEVELOPERS.md).
export default defineConfig({
  dialect: 'mysql',
  schema: './server/db/schema.ts',
  out: './drizzle',
});
