// Integration and e2e tests run against the services scripts/test.sh starts. This guard
// refuses to run anywhere else, so a test can never write to a shared or real database.
export default async function setup() {
  const url = process.env.DATABASE_URL ?? "";
  const base = process.env.TEST_BASE_URL ?? "";
  if (!url || !base) throw new Error("Run integration and e2e tests through `npm test` (scripts/test.sh), which starts the services.");
  const db = new URL(url);
  if (db.hostname !== "127.0.0.1" || !db.pathname.startsWith("/fitframe_test")) {
    throw new Error(`Refusing to test against ${db.hostname}${db.pathname}: only a local fitframe_test_* database`);
  }
  const health = await fetch(`${base}/api/health`).catch(() => null);
  if (!health?.ok) throw new Error(`The web app at ${base} does not answer /api/health`);
}
