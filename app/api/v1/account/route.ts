import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { signUpBody } from "@/lib/server/schemas";
import { signUp } from "@/lib/server/services/users";

/** Sign up: a new member account. */
export const POST = route(async (req) => {
  const body = await parseBody(req, signUpBody, 10_000);
  const account = await signUp(await requestEm(), body);
  return json({ account }, 201);
});
