// Environment checked once at start: a missing or malformed variable fails loudly by name.
import { z } from "zod";

const envSchema = z.object({
  DATABASE_URL: z.string().url(),
  NEXTAUTH_URL: z.string().url().default("http://127.0.0.1:3000"),
  NEXTAUTH_SECRET: z.string().min(16, "NEXTAUTH_SECRET must be at least 16 characters"),
  S3_ENDPOINT: z.string().url().optional(),
  S3_PUBLIC_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().min(1).default("fitframe"),
  S3_ACCESS_KEY_ID: z.string().min(1).default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().min(1).default("S3RVER"),
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).default("true").transform((v) => v === "true"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(1025),
  SMTP_SECURE: z.enum(["true", "false"]).default("false").transform((v) => v === "true"),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default("Fitframe <no-reply@fitframe.local>"),
  UPLOAD_MAX_BYTES: z.coerce.number().int().positive().default(1024 * 1024 * 1024),
  WORKER_CONCURRENCY: z.coerce.number().int().min(1).max(16).default(1),
  // After this long a clip job still running is given to another worker (its own died).
  CLIP_JOB_EXPIRE_S: z.coerce.number().int().min(10).default(900),
  PGBOSS_MAINTENANCE_S: z.coerce.number().int().min(1).default(60),
  // Comment e-mails: at most one per person per clip in this many seconds; the worker looks every poll.
  COMMENT_MAIL_WINDOW_S: z.coerce.number().int().min(1).default(600),
  COMMENT_MAIL_POLL_S: z.coerce.number().positive().default(2),
  // Payments: the official Stripe SDK; locally pointed at scripts/payments-fake.ts on loopback.
  STRIPE_SECRET_KEY: z.string().min(1).default("sk_test_fitframe_local"),
  STRIPE_WEBHOOK_SECRET: z.string().min(1).default("whsec_fitframe_local_only"),
  STRIPE_API_HOST: z.string().min(1).default("127.0.0.1"),
  STRIPE_API_PORT: z.coerce.number().int().positive().optional(),
  STRIPE_API_PROTOCOL: z.enum(["http", "https"]).default("http"),
  PAYMENTS_PORT: z.coerce.number().int().positive().default(4242),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function env(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const names = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Invalid environment — ${names}`);
  }
  cached = parsed.data;
  return cached;
}
