// Command line for the schema and the demo data: tsx db/cli.ts migrate|rollback [--all]|seed|reset|status
import { closeSequelize, getSequelize } from "./sequelize.ts";
import { createMigrator, createSeeder, forgetSeeds } from "./migrator.ts";

async function main(command: string | undefined, flags: string[]) {
  const sequelize = getSequelize();
  const migrator = createMigrator(sequelize);
  const seeder = createSeeder(sequelize);
  switch (command) {
    case "migrate": {
      const done = await migrator.up();
      console.log(done.length ? `migrated: ${done.map((m) => m.name).join(", ")}` : "schema is up to date");
      break;
    }
    case "rollback": {
      const all = flags.includes("--all");
      const undone = all ? await migrator.down({ to: 0 }) : await migrator.down();
      if (all) await forgetSeeds(sequelize);
      console.log(undone.length ? `rolled back: ${undone.map((m) => m.name).join(", ")}` : "nothing to roll back");
      break;
    }
    case "seed": {
      const done = await seeder.up();
      console.log(done.length ? `seeded: ${done.map((m) => m.name).join(", ")}` : "demo data already present");
      break;
    }
    case "reset": {
      await migrator.down({ to: 0 });
      await forgetSeeds(sequelize);
      await migrator.up();
      const seeded = await seeder.up();
      console.log(`reset: schema rebuilt, ${seeded.length} seed(s) loaded`);
      break;
    }
    case "status": {
      const pending = await migrator.pending();
      console.log(pending.length ? `pending: ${pending.map((m) => m.name).join(", ")}` : "schema is up to date");
      break;
    }
    default:
      console.error("usage: tsx db/cli.ts migrate|rollback [--all]|seed|reset|status");
      process.exitCode = 2;
  }
}

main(process.argv[2], process.argv.slice(3))
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
