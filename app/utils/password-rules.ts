import { z } from "zod";

/** Length over composition rules, per NIST SP 800-63B §5.1.1 (at least 8 characters; we ask 10). */
export const NewPasswordSchema = z.string().min(10, "Use at least 10 characters.").max(200, "Use at most 200 characters.");
