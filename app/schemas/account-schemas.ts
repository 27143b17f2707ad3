import { z } from "zod";
import { ROLES } from "~/utils/roles";

export const EmailSchema = z.string().trim().email("Enter an e-mail address.").max(254);

/** `POST /api/v1/invitations` and the invite form. */
export const InviteSchema = z.object({ email: EmailSchema, role: z.enum(ROLES) });

/** `POST /api/v1/tokens`. */
export const TokenRequestSchema = z.object({
  email: EmailSchema,
  password: z.string().min(1).max(200),
  label: z.string().trim().min(1).max(80).optional(),
});
