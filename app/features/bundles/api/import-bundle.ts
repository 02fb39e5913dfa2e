// POST /api/projects/import (a new project owned by the importer) and
// POST /api/projects/:projectId/import (into a project; editors and owners): multipart field
// "bundle". Answers the import report; a refused file changes nothing and names the fields at fault.
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { importReportSchema, type ImportReport } from '../../../../shared/api/bundle';

/** Where the bundle goes: a new project, or the project with this id. */
export type ImportTarget = 'new project' | number;

export function importBundle(target: ImportTarget, file: File): Promise<ImportReport> {
  const form = new FormData();
  form.append('bundle', file);
  const path = target === 'new project' ? '/projects/import' : `/projects/${target}/import`;
  return api.upload(path, form, importReportSchema);
}

/** `onImported` lets the page refresh what the import changed (project list, figure table). */
export function useImportBundle(target: ImportTarget, onImported: (report: ImportReport) => void) {
  return useMutation({
    mutationFn: (file: File) => importBundle(target, file),
    onSuccess: onImported,
  });
}
