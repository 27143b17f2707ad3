import { and, eq, sql } from "drizzle-orm";
import { ACQUISITION_STATUSES, COMMITTED_STATUSES, type AcquisitionStatus } from "~/calculations/acquisition-status";
import { parcelCases, users } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";

export interface AcquisitionProgress {
  parcels: number;
  unassigned: number;
  /** Parcels and their estimated cost at each status (every status present, zero when none). */
  byStatus: Record<AcquisitionStatus, { parcels: number; estimatedCost: number }>;
  /** Estimated cost of the parcels agreed or acquired: an estimate of what is committed so far. */
  committedCost: number;
  estimatedCost: number;
  byAgent: { agentId: number | null; name: string | null; email: string | null; parcels: number; acquired: number }[];
}

/** The acquisition progress of the project's open cases (the preferred alternative's parcels). */
export function readAcquisitionProgress(projectId: number, tx: Db = db()): AcquisitionProgress {
  const open = and(eq(parcelCases.projectId, projectId), eq(parcelCases.state, "open"));
  const rows = tx
    .select({ status: parcelCases.status, parcels: sql<number>`count(*)`, cost: sql<number>`coalesce(sum(${parcelCases.estimatedCost}), 0)` })
    .from(parcelCases)
    .where(open)
    .groupBy(parcelCases.status)
    .all();
  const byStatus = Object.fromEntries(ACQUISITION_STATUSES.map((s) => [s, { parcels: 0, estimatedCost: 0 }])) as AcquisitionProgress["byStatus"];
  for (const r of rows) byStatus[r.status] = { parcels: r.parcels, estimatedCost: r.cost };
  const byAgent = tx
    .select({
      agentId: parcelCases.agentId,
      name: users.name,
      email: users.email,
      parcels: sql<number>`count(*)`,
      acquired: sql<number>`sum(case when ${parcelCases.status} = 'acquired' then 1 else 0 end)`,
    })
    .from(parcelCases)
    .leftJoin(users, eq(users.id, parcelCases.agentId))
    .where(open)
    .groupBy(parcelCases.agentId)
    .orderBy(users.name)
    .all();
  const parcels = rows.reduce((s, r) => s + r.parcels, 0);
  return {
    parcels,
    unassigned: byAgent.find((a) => a.agentId === null)?.parcels ?? 0,
    byStatus,
    committedCost: COMMITTED_STATUSES.reduce((s, k) => s + byStatus[k].estimatedCost, 0),
    estimatedCost: rows.reduce((s, r) => s + r.cost, 0),
    byAgent,
  };
}
