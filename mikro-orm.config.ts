import "reflect-metadata";
import { defineConfig } from "@mikro-orm/postgresql";
import { Migrator } from "@mikro-orm/migrations";
import { entities } from "./entities";
import { databaseUrl } from "./lib/db/url";

export default defineConfig({
  clientUrl: databaseUrl(),
  entities,
  extensions: [Migrator],
  migrations: {
    path: "./migrations",
    pathTs: "./migrations",
    glob: "!(*.d).{js,ts}",
    transactional: true,
    allOrNothing: true,
    snapshot: false,
    emit: "ts",
  },
  // Entities are found through the list above, never by scanning folders (the bundler moves them).
  discovery: { warnWhenNoEntities: true, requireEntitiesArray: true },
  pool: { min: 0, max: 10 },
  debug: process.env.DB_DEBUG === "1",
});
