import type { Role } from "../domain/roles";

export declare const DEMO_SIGN_INS: {
  password: string;
  users: { role: Role; email: string; name: string; org: "main" | "other" }[];
};
