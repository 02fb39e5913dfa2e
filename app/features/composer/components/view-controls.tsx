// Camera of the 3D figures: turn, tilt, projection, zoom and lighting. 2D figures have no camera.
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import { patchView } from '../utils/spec-edits';
import type { EditSpec } from '../utils/spec-history';
import { ChoiceField } from './choice-field';
import { ControlGroup } from './control-group';
import { NumberField } from './number-field';

export function ViewControls({
  spec,
  onEdit,
  readOnly,
  threeDimensional,
}: {
  spec: FigureSpec;
  onEdit: EditSpec;
  readOnly: boolean;
  threeDimensional: boolean;
}) {
  const v = spec.view;
  return (
    <ControlGroup
      legend="Camera"
      note={
        threeDimensional
          ? 'You can also drag the figure, or focus it and use the arrow keys.'
          : 'This figure is flat: the camera applies to 3D figures only.'
      }
    >
      <div className="grid grid-cols-2 gap-3">
        <NumberField
          label="Turn (azimuth)"
          unit="°"
          value={v.azimuthDeg}
          min={-360}
          max={360}
          step={5}
          decimals={1}
          disabled={readOnly || !threeDimensional}
          onChange={(azimuthDeg) => onEdit(patchView(spec, { azimuthDeg }), 'view.azimuthDeg')}
        />
        <NumberField
          label="Tilt (elevation)"
          unit="°"
          value={v.elevationDeg}
          min={-90}
          max={90}
          step={5}
          decimals={1}
          disabled={readOnly || !threeDimensional}
          onChange={(elevationDeg) =>
            onEdit(patchView(spec, { elevationDeg }), 'view.elevationDeg')
          }
        />
        <NumberField
          label="Zoom"
          unit="×"
          value={v.zoom}
          min={0.1}
          max={10}
          step={0.1}
          decimals={3}
          disabled={readOnly || !threeDimensional}
          onChange={(zoom) => onEdit(patchView(spec, { zoom }), 'view.zoom')}
        />
        <ChoiceField
          label="Projection"
          value={v.projection}
          disabled={readOnly || !threeDimensional}
          choices={[
            { value: 'orthographic', label: 'Orthographic (true sizes)' },
            { value: 'perspective', label: 'Perspective' },
          ]}
          onChange={(projection) => onEdit(patchView(spec, { projection }), 'view.projection')}
        />
        <ChoiceField
          label="Lighting"
          className="col-span-2"
          value={v.lighting}
          disabled={readOnly || !threeDimensional}
          choices={[
            { value: 'soft', label: 'Soft' },
            { value: 'bright', label: 'Bright' },
            { value: 'flat', label: 'Flat (no shading)' },
          ]}
          onChange={(lighting) => onEdit(patchView(spec, { lighting }), 'view.lighting')}
        />
      </div>
    </ControlGroup>
  );
}
