// The project audit trail: who changed roles, style, figures, approvals, exports, and when.
import type { Knex } from 'knex';
import type { AuditEntry } from '../../shared/api/schemas';

export type AuditAction =
  | 'member.added'
  | 'member.role_changed'
  | 'member.removed'
  | 'invitation.sent'
  | 'invitation.withdrawn'
  | 'invitation.accepted'
  | 'project.renamed'
  | 'project.archived'
  | 'project.restored'
  | 'house_style.changed'
  | 'figure.created'
  | 'figure.saved'
  | 'figure.deleted'
  | 'figure.reordered'
  | 'figure.copied'
  | 'figure.review'
  | 'export.started'
  | 'bundle.imported'
  | 'dataset.uploaded'
  | 'dataset.deleted';

export async function recordAudit(
  db: Knex,
  entry: { projectId: number; actorId: number | null; action: AuditAction; summary: string },
): Promise<void> {
  await db('audit_entries').insert({
    project_id: entry.projectId,
    actor_id: entry.actorId,
    action: entry.action,
    summary: entry.summary,
  });
}

export async function listAudit(db: Knex, projectId: number, limit = 500): Promise<AuditEntry[]> {
  const rows = await db('audit_entries as a')
    .leftJoin('users as u', 'u.id', 'a.actor_id')
    .where('a.project_id', projectId)
    .orderBy('a.id', 'desc')
    .limit(limit)
    .select('a.*', 'u.name as actor_name');
  return rows.map((r) => ({
    id: Number(r.id),
    actorName: r.actor_name ?? '(system)',
    action: r.action,
    summary: r.summary,
    createdAt: r.created_at.toISOString(),
  }));
}
