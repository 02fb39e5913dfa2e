// /: the projects the signed-in user belongs to, active or archived, and a way to start one.
import { useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { Button } from '../components/ui/button';
import { Dialog } from '../components/ui/dialog';
import { PageHeader } from '../components/ui/page-header';
import { SegmentedChoice } from '../components/ui/segmented-choice';
import { ErrorPanel, Loading } from '../components/ui/status';
import { ImportBundleForm } from '../features/bundles/components/import-bundle-form';
import { projectsQueryKey, useProjects } from '../features/projects/api/get-projects';
import { CreateProjectForm } from '../features/projects/components/create-project-form';
import { ProjectList } from '../features/projects/components/project-list';
import { useDocumentTitle } from '../hooks/use-document-title';

type Shown = 'active' | 'archived';
const shownOptions = [
  { value: 'active', label: 'Active' },
  { value: 'archived', label: 'Archived' },
] as const;

export function ProjectsRoute() {
  useDocumentTitle('Projects');
  const [shown, setShown] = useState<Shown>('active');
  const [creating, setCreating] = useState(false);
  const [importing, setImporting] = useState(false);
  const queryClient = useQueryClient();
  const projects = useProjects({ archived: shown === 'archived' });
  const navigate = useNavigate();

  return (
    <>
      <PageHeader
        title="Projects"
        actions={
          <>
            <Button onClick={() => setImporting(true)}>Import bundle</Button>
            <Button variant="primary" onClick={() => setCreating(true)}>
              New project
            </Button>
          </>
        }
      >
        <p className="max-w-2xl text-stone-700">
          Each project holds a set of figures, their revisions and the people working on them.
        </p>
      </PageHeader>

      <div className="mb-4">
        <SegmentedChoice
          legend="Which projects to show"
          options={shownOptions}
          value={shown}
          onChange={setShown}
        />
      </div>

      {projects.isPending ? (
        <Loading label="Loading projects…" />
      ) : projects.isError ? (
        <ErrorPanel error={projects.error} onRetry={() => void projects.refetch()} />
      ) : (
        <ProjectList
          projects={projects.data}
          emptyText={
            shown === 'archived'
              ? 'No archived projects.'
              : 'No projects yet. Start one with “New project”.'
          }
        />
      )}

      <Dialog
        open={importing}
        onClose={() => setImporting(false)}
        title="New project from a bundle"
        description="The bundle’s figures, house style and data become a new project that you own."
      >
        <ImportBundleForm
          target="new project"
          onImported={() => void queryClient.invalidateQueries({ queryKey: projectsQueryKey })}
        />
      </Dialog>

      <Dialog
        open={creating}
        onClose={() => setCreating(false)}
        title="New project"
        description="You will be its owner and can add members afterwards."
      >
        <CreateProjectForm
          onCancel={() => setCreating(false)}
          onCreated={(project) => {
            setCreating(false);
            void navigate(`/projects/${project.id}`);
          }}
        />
      </Dialog>
    </>
  );
}
