import type { Role } from "@/lib/access/policy";

declare module "next-auth" {
  interface User {
    id: string;
    role: Role;
    studioId: string;
    sessionVersion: number;
  }
  interface Session {
    user: { id: string; role: Role; sessionVersion: number; name?: string | null; email?: string | null; image?: string | null };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid: string;
    role: Role;
    studioId: string;
    sv: number;
  }
}
