import bcrypt from "bcryptjs";

const COMMON = ["password", "123456", "qwerty", "letmein", "benchwright", "woodshop", "garage", "iloveyou", "admin", "welcome"];

/** The password rule: at least 10 characters, letters plus a digit or symbol, nothing common, not the e-mail name. Returns a message or null. */
export function passwordProblem(password: string, email = ""): string | null {
  if (password.length < 10) return "Use at least 10 characters.";
  if (password.length > 200) return "Use at most 200 characters.";
  if (!/[A-Za-z]/.test(password) || !/[^A-Za-z]/.test(password)) return "Mix letters with at least one digit or symbol.";
  const lower = password.toLowerCase();
  if (COMMON.some((w) => lower.includes(w))) return "That password is too easy to guess: avoid common words.";
  const name = email.split("@")[0]?.toLowerCase();
  if (name && name.length >= 4 && lower.includes(name)) return "Do not use your e-mail name in the password.";
  if (new Set(lower).size < 5) return "Use more different characters.";
  return null;
}

/** bcrypt cost of every stored hash (about 170 ms a compare on this project's 2-core machines). */
export const HASH_ROUNDS = 11;

/**
 * A hash of a random secret nobody knows, at the same cost as stored hashes. Signing in as an
 * unknown account compares against it, so the answer takes as long as for a known account and its
 * timing does not tell which e-mails have accounts.
 */
export const DUMMY_HASH = "$2b$11$U1HxSNXuUUTCJJ.Kspbb5ONqSRgRYmR229XFUgnSMxV4zHJih7TI.";

export const hashPassword = (p: string) => bcrypt.hash(p, HASH_ROUNDS);
export const checkPassword = (p: string, hash: string) => bcrypt.compare(p, hash);

/** Checks a password against an account's hash, or (no account) against DUMMY_HASH with the same work; false without an account. */
export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  const ok = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return ok && !!hash;
}
