import { z } from "zod";
import { ACCOUNT_ROLES } from "@/entities/User";

/** Request shapes shared by route handlers. */
export const idParam = z.object({ id: z.string().uuid() });
export const planName = z.string().trim().min(1, "Give the plan a name.").max(120, "Keep the name under 120 characters.");
export const createPlanBody = z.object({ name: planName, document: z.unknown().optional() });
export const updatePlanBody = z.object({ document: z.unknown(), version: z.number().int().min(1), name: planName.optional() });
export const renameBody = z.object({ name: planName });
export const restoreRevisionBody = z.object({ version: z.number().int().min(1) });
export const signUpBody = z.object({
  name: z.string().trim().min(1, "Tell us your name.").max(100),
  email: z.string().trim().toLowerCase().email("Enter a valid e-mail address.").max(254),
  password: z.string().min(1, "Choose a password.").max(200),
});
export const roleBody = z.object({ role: z.enum(ACCOUNT_ROLES) });
