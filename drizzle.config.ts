import { defineConfig } from 'drizzle-kit';

// Migrations are generated from server/db/schema.ts and committed (never `push`).
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema.ts',
  out: './drizzle',
  casing: 'snake_case',
});
