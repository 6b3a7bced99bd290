import { z } from "zod";

/** Param and body shapes for the sharing and teaching routes. */
export const planChild = (key: string) => z.object({ id: z.string().uuid(), [key]: z.string().uuid() });
/** Link tokens are printable ASCII (ours are base64url); anything else is an unknown link, never a database error. */
export const tokenParam = z.object({ token: z.string().min(1).max(200).regex(/^[\x21-\x7e]+$/) });
export const createLinkBody = z.object({
  label: z.string().trim().max(80).optional(),
  /** Either an absolute expiry or a number of days from now; neither means no expiry. */
  expiresAt: z.iso.datetime({ offset: true, error: "Use an ISO date and time." }).optional(),
  expiresInDays: z.number().int().min(1).max(365).optional(),
});
export const inviteBody = z.object({
  email: z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(254),
  role: z.enum(["editor", "viewer"], { error: "Choose editor or viewer." }),
});
export const memberRoleBody = z.object({ role: z.enum(["editor", "viewer"], { error: "Choose editor or viewer." }) });
export const copyBody = z.object({ name: z.string().trim().min(1).max(120).optional() }).default({});
export const resetRequestBody = z.object({ email: z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(254) });
export const resetConfirmBody = z.object({ token: z.string().min(1).max(200), password: z.string().min(1, "Choose a password.").max(200) });
export const tokenBody = z.object({ token: z.string().min(1).max(200) });
export const adoptPresetBody = z.object({ presetId: z.string().uuid().nullable(), version: z.number().int().min(1) });
export const ownerQuery = z.string().uuid().optional();
