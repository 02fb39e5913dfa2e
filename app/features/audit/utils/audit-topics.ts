// Groups audit actions ("member.role_changed", "house_style.changed", …) into the topics an owner
// asks about, so the trail can be narrowed to one. Actions the client does not know yet fall
// under "Other" instead of disappearing.
import type { AuditEntry } from '../../../../shared/api/schemas';

export const auditTopics = [
  { id: 'people', label: 'Members and invitations', prefixes: ['member', 'invitation'] },
  { id: 'figures', label: 'Figures', prefixes: ['figure'] },
  { id: 'style', label: 'House style', prefixes: ['house_style'] },
  { id: 'project', label: 'Project', prefixes: ['project'] },
  { id: 'exports', label: 'Exports and imports', prefixes: ['export', 'bundle'] },
  { id: 'data', label: 'Data uploads', prefixes: ['dataset'] },
] as const;

export type AuditTopicId = (typeof auditTopics)[number]['id'] | 'other';

export function auditTopic(action: string): AuditTopicId {
  const prefix = action.split('.', 1)[0] ?? '';
  const topic = auditTopics.find((t) => (t.prefixes as readonly string[]).includes(prefix));
  return topic?.id ?? 'other';
}

export function auditTopicLabel(id: AuditTopicId): string {
  return auditTopics.find((t) => t.id === id)?.label ?? 'Other';
}

export function filterAudit(entries: readonly AuditEntry[], topic: AuditTopicId | 'all'): AuditEntry[] {
  return topic === 'all' ? [...entries] : entries.filter((e) => auditTopic(e.action) === topic);
}
