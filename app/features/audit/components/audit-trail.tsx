// The project's audit trail for its owners: who changed roles, style, figures, approvals and
// exports, and when; newest first, narrowed to one topic if wished.
import { useState } from 'react';
import { SelectField } from '../../../components/ui/form-field';
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { formatDateTime } from '../../../utils/format-date';
import { sentence } from '../../../utils/sentence';
import { useAudit } from '../api/get-audit';
import {
  auditTopic,
  auditTopicLabel,
  auditTopics,
  filterAudit,
  type AuditTopicId,
} from '../utils/audit-topics';

export function AuditTrail({ projectId }: { projectId: number }) {
  const audit = useAudit(projectId);
  const [topic, setTopic] = useState<AuditTopicId | 'all'>('all');

  if (audit.isPending) return <Loading label="Loading the audit trail…" />;
  if (audit.isError) return <ErrorPanel error={audit.error} onRetry={() => void audit.refetch()} />;

  const entries = filterAudit(audit.data, topic);
  return (
    <div className="space-y-4">
      <SelectField
        label="Show"
        name="topic"
        value={topic}
        onChange={(e) => setTopic(e.target.value as AuditTopicId | 'all')}
        className="w-72"
      >
        <option value="all">Everything</option>
        {auditTopics.map((t) => (
          <option key={t.id} value={t.id}>
            {t.label}
          </option>
        ))}
        <option value="other">Other</option>
      </SelectField>
      {entries.length === 0 ? (
        <p className="text-sm text-stone-600">
          {audit.data.length === 0 ? 'Nothing has been recorded yet.' : 'Nothing of this kind has been recorded.'}
        </p>
      ) : (
        <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
          <table className="w-full border-collapse text-sm">
            <caption className="sr-only">Changes to this project, newest first</caption>
            <thead className="border-b border-stone-200 bg-stone-50 text-left text-stone-700">
              <tr>
                <th scope="col" className="px-3 py-2 font-semibold">
                  When
                </th>
                <th scope="col" className="px-3 py-2 font-semibold">
                  Who
                </th>
                <th scope="col" className="px-3 py-2 font-semibold">
                  What
                </th>
                <th scope="col" className="px-3 py-2 font-semibold">
                  Topic
                </th>
              </tr>
            </thead>
            <tbody>
              {entries.map((entry) => (
                <tr key={entry.id} className="border-b border-stone-100 align-top last:border-0">
                  <td className="px-3 py-2 whitespace-nowrap text-stone-700">
                    <time dateTime={entry.createdAt}>{formatDateTime(entry.createdAt)}</time>
                  </td>
                  <th scope="row" className="px-3 py-2 text-left font-semibold">
                    {entry.actorName}
                  </th>
                  <td className="px-3 py-2">{sentence(entry.summary)}</td>
                  <td className="px-3 py-2 text-stone-600">
                    {auditTopicLabel(auditTopic(entry.action))}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
