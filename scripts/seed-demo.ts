export {};
/** Migrates the database at DATABASE_URL and creates or refreshes the invented demo scenario. */
const { seedDemo } = await import("../app/models/demo-seed.server");
const result = await seedDemo();
console.log(`Demo scenario ready: ${result.users} accounts, project #${result.projectId}, ${result.features} features loaded.`);
