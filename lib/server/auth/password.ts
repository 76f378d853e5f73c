import "server-only";
import bcrypt from "bcryptjs";

const COST = 10;

export const hashPassword = (plain: string) => bcrypt.hash(plain, COST);
export const verifyPassword = (plain: string, hash: string) => bcrypt.compare(plain, hash);

// Compared against when the account does not exist, so both paths take the same time.
export const DUMMY_HASH = "$2b$10$CwTycUXWue0Thq9StjUM0uJ8.1Qw8bZ2oN3a7CFs1S0P5ZlXj9E7a";
