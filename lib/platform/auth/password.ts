import bcrypt from "bcryptjs";

const COST = 11;

// A real hash of a throw-away value, compared against when the account does not exist, so a
// wrong e-mail takes as long as a wrong password and does not reveal which accounts exist.
const DUMMY_HASH = bcrypt.hashSync("not-a-real-password-hubface", COST);

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string | null | undefined): Promise<boolean> {
  return bcrypt.compare(plain, hash ?? DUMMY_HASH).then((ok) => ok && !!hash);
}
