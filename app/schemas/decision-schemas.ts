import { z } from "zod";
import { ACQUISITION_STATUSES } from "~/calculations/acquisition-status";
import { EmailSchema } from "./account-schemas";

const Comment = z.string().trim().max(4000, "Keep the comment under 4,000 characters.");
const ParcelId = z.string().trim().min(1).max(200);
const AssignmentList = z.array(z.object({ parcelId: ParcelId, agentEmail: EmailSchema.nullable() }).strict());

/** `PUT /api/v1/alternatives/:id/assignments`: named parcels to named agents (null = unassign), or an even split. */
export const AssignmentsSchema = z.union([
  z.object({ assignments: AssignmentList.min(1).max(20_000) }).strict(),
  z.object({ split: z.literal("even"), parcelIds: z.array(ParcelId).min(1).max(20_000).optional() }).strict(),
]);

/** `POST /api/v1/alternatives/:id/submit {comment?}`. */
export const SubmitSchema = z.object({ comment: Comment.default("") }).strict();

/** `POST /api/v1/alternatives/:id/withdraw {comment?}`. */
export const WithdrawSchema = SubmitSchema;

/**
 * `POST /api/v1/alternatives/:id/decision {decision, comment}`; optional `version` (the one the
 * manager reviewed) and, on approval, `split: "even"` or `assignments` to assign parcels at once.
 */
export const DecisionSchema = z
  .object({
    decision: z.enum(["approve", "return"]),
    comment: Comment,
    version: z.number().int().positive().optional(),
    split: z.literal("even").optional(),
    assignments: AssignmentList.max(20_000).optional(),
  })
  .strict()
  .refine((d) => d.decision === "approve" || d.comment.length > 0, { message: "Say what should change: a returned alternative needs comments.", path: ["comment"] })
  .refine((d) => d.decision === "approve" || (d.split === undefined && d.assignments === undefined), { message: "Parcels are assigned only on approval.", path: ["decision"] })
  .refine((d) => !(d.split && d.assignments), { message: "Give either split or assignments, not both.", path: ["split"] });

/** `PATCH /api/v1/me/parcels/:caseId {status?, note?}`. */
export const CasePatchSchema = z
  .object({ status: z.enum(ACQUISITION_STATUSES).optional(), note: z.string().trim().max(4000, "Keep the note under 4,000 characters.").optional() })
  .strict()
  .refine((p) => p.status !== undefined || (p.note !== undefined && p.note.length > 0), { message: "Give a status, a note, or both." });

/** `GET /api/v1/me/parcels?status=…&projectId=…&released=1`. */
export const WorkQuerySchema = z.object({
  status: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(",").filter(Boolean) : []))
    .pipe(z.array(z.enum(ACQUISITION_STATUSES))),
  projectId: z.coerce.number().int().positive().optional(),
  released: z.enum(["0", "1"]).optional(),
});
