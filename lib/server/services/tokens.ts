import { createHash, randomBytes } from "node:crypto";

/** A bearer token for links (256 random bits, base64url) and the SHA-256 hex digest that is stored instead. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export const hashToken = (token: string) => createHash("sha256").update(token, "utf8").digest("hex");

/** Tokens we issue are 43 base64url characters; anything else cannot match, so callers can answer 404 early. */
export const tokenShape = /^[A-Za-z0-9_-]{43}$/;
