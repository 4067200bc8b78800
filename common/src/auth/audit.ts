/** One entry of the audit log as `GET /api/audit` returns it (newest first). */
export interface AuditEntryView {
  id: number;
  /** ISO 8601 UTC. */
  at: string;
  /** null for changes made by the system (demo seed, conditions feed). */
  actorUserId: number | null;
  actorEmail: string | null;
  actorName: string | null;
  /** Dotted verb, e.g. `user.create`, `profile.publish`. */
  action: string;
  /** What was changed, e.g. `user:12`. */
  target: string;
  detail: Record<string, unknown> | null;
}
