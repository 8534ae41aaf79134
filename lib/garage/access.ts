/** The garage belongs to members (admins keep one too); every row is scoped by the caller. */
export const GARAGE_ACCESS = ["member", "admin"] as const;
