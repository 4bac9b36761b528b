import { defineConfig } from "drizzle-kit";

// `npm run db:generate` writes SQL migrations into drizzle/ from server/db/schema.ts.
// The server applies them at start-up; DATABASE_URL is only needed for drizzle-kit's
// own database commands (studio, check against a live database).
export default defineConfig({
  dialect: "postgresql",
  schema: "./server/db/schema.ts",
  out: "./drizzle",
  dbCredentials: { url: process.env.DATABASE_URL ?? "postgres://localhost:4310/linkleap" },
  strict: true,
  verbose: true,
});
