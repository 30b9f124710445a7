import type { RoleName } from "@/lib/policy/permissions";

declare module "next-auth" {
  interface User {
    role: RoleName;
    sessionVersion: number;
  }
  interface Session {
    uid: string;
    sv: number;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid: string;
    role: RoleName;
    sv: number;
  }
}
