// One pool per process, on the server only: the web app, the worker and scripts (the last two
// run with `--conditions=react-server`, where the server-only fence resolves to nothing).
import "server-only";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { env } from "@/lib/config/env";
import * as schema from "./schema";

const globalForDb = globalThis as unknown as { fitframePool?: Pool };

export const pool = globalForDb.fitframePool ?? new Pool({ connectionString: env().DATABASE_URL, max: 10 });
globalForDb.fitframePool = pool;

export const db = drizzle(pool, { schema });
export type Db = typeof db;
export { schema };
