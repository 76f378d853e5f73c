import "server-only";
import { createHash, randomBytes } from "node:crypto";

const PREFIX = "ff_";

/** 256 bits of randomness; only the SHA-256 hash is stored, the value is shown once. */
export function newTokenValue(): string {
  return PREFIX + randomBytes(32).toString("base64url");
}

export function hashToken(value: string): string {
  return createHash("sha256").update(value).digest("hex");
}
