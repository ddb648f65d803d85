import type { Role } from "@/lib/domain/stored-values";

export type UserStatus = "active" | "invited" | "deactivated";
export type UserDto = { id: string; name: string; email: string; role: Role; status: UserStatus; lastSignInAt: string | null };
