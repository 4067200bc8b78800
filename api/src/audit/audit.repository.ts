import type { AuditEntryView } from './audit-entry-view.js';

export interface AuditFilter {
  limit: number;
  offset: number;
  action?: string;
  actorUserId?: number;
  target?: string;
}

/** Reads the audit log (written by each module in the transaction of its change). */
export abstract class AuditRepository {
  abstract list(filter: AuditFilter): { rows: AuditEntryView[]; total: number };
}
