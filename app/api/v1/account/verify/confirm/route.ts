import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { confirmVerify } from "@/lib/server/services/email-tokens";
import { tokenBody } from "@/lib/server/services/route-params";

/** Confirm an address with the e-mailed link: { token }. */
export const POST = route(async (req) => {
  const body = await parseBody(req, tokenBody, 10_000);
  return json({ verified: true, ...(await confirmVerify(await requestEm(), body.token)) });
});
