// /projects/:projectId/data: uploaded radial data (CSV) that radial figures draw beside computed
// curves; editors upload and delete, everyone in the project reads the list.
import { Panel } from '../components/ui/panel';
import { DatasetList } from '../features/datasets/components/dataset-list';
import { DatasetUploadForm } from '../features/datasets/components/dataset-upload-form';
import { roleAllows } from '../../shared/api/roles';
import { FigureDataLinks } from './figure-data-links';
import { useProjectFromLayout } from './project-layout';

export function ProjectDataRoute() {
  const project = useProjectFromLayout();
  const canEdit = roleAllows(project.role, 'edit') && !project.archived;
  return (
    <div className="space-y-6">
      <section aria-labelledby="datasets-title" className="space-y-3">
        <h2 id="datasets-title" className="text-lg font-semibold">
          Uploaded data
        </h2>
        <p className="max-w-3xl text-sm text-stone-600">
          A radial figure can draw up to six of these beside its computed curves, by id (
          <code>kind.datasets</code> in its spec). Values are kept in atomic units.
        </p>
        <DatasetList projectId={project.id} canEdit={canEdit} />
      </section>
      <Panel id="figure-data-title" title="Figures drawing data">
        <FigureDataLinks projectId={project.id} canEdit={canEdit} />
      </Panel>
      {canEdit && (
        <Panel id="upload-dataset-title" title="Upload data">
          <DatasetUploadForm projectId={project.id} />
        </Panel>
      )}
    </div>
  );
}
