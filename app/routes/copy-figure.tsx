// /figures/:figureId/copy: copy a figure into another project the user may edit (editor or owner
// there and here); the copy keeps its number when free there and opens when done.
import { useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { roleAllows } from '../../shared/api/roles';
import { Button } from '../components/ui/button';
import { SelectField } from '../components/ui/form-field';
import { PageHeader } from '../components/ui/page-header';
import { Panel } from '../components/ui/panel';
import { ErrorPanel, FormAlert, Loading } from '../components/ui/status';
import { useCopyFigure } from '../features/figures/api/copy-figure';
import { useFigure } from '../features/figures/api/get-figure';
import { projectsQueryKey, useProjects } from '../features/projects/api/get-projects';
import { useDocumentTitle } from '../hooks/use-document-title';
import { NotFoundRoute } from './not-found';
import { parseIdParam } from './parse-id-param';

export function CopyFigureRoute() {
  const figureId = parseIdParam(useParams().figureId);
  if (figureId === null) return <NotFoundRoute />;
  return <CopyFigurePage figureId={figureId} />;
}

function CopyFigurePage({ figureId }: { figureId: number }) {
  const figure = useFigure(figureId);
  const projects = useProjects({ archived: false });
  const copy = useCopyFigure(figureId);
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [target, setTarget] = useState('');
  useDocumentTitle(figure.data ? `Copy ${figure.data.title}` : 'Copy figure');

  if (figure.isPending || projects.isPending) return <Loading label="Loading…" />;
  if (figure.isError)
    return <ErrorPanel error={figure.error} onRetry={() => void figure.refetch()} />;
  if (projects.isError)
    return <ErrorPanel error={projects.error} onRetry={() => void projects.refetch()} />;
  const f = figure.data;
  const targets = projects.data.filter((p) => roleAllows(p.role, 'edit'));

  function submit(e: FormEvent) {
    e.preventDefault();
    if (!target) return;
    copy.mutate(Number(target), {
      onSuccess: (made) => {
        void queryClient.invalidateQueries({ queryKey: projectsQueryKey });
        void navigate(`/figures/${made.id}`);
      },
    });
  }

  return (
    <>
      <PageHeader
        context={
          <Link
            to={`/figures/${f.id}`}
            className="underline underline-offset-2 hover:text-stone-900"
          >
            {f.number ? `Figure ${f.number}` : f.title}
          </Link>
        }
        title="Copy to another project"
      >
        <p className="max-w-2xl text-stone-700">
          The copy starts as a draft with this figure’s current spec, caption, alt text and the data
          it draws. It keeps its number when the other project does not use it yet.
        </p>
      </PageHeader>
      <Panel id="copy-figure-title" title={f.title}>
        {targets.length === 0 ? (
          <p className="text-sm text-stone-600">
            You are not an editor or owner of any active project.
          </p>
        ) : (
          <form onSubmit={submit} className="max-w-md space-y-4" noValidate>
            <SelectField
              label="Into project"
              value={target}
              onChange={(e) => setTarget(e.target.value)}
              required
            >
              <option value="">Choose…</option>
              {targets.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                  {p.id === f.projectId ? ' (this project)' : ''}
                </option>
              ))}
            </SelectField>
            {copy.isError && <FormAlert message={copy.error.message} />}
            <Button type="submit" variant="primary" busy={copy.isPending} disabled={!target}>
              {copy.isPending ? 'Copying…' : 'Copy figure'}
            </Button>
          </form>
        )}
      </Panel>
    </>
  );
}
