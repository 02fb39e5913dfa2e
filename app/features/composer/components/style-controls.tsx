// Look and print settings. Each one either comes from the project's house style (shown as such)
// or is set for this figure; "Use house style" clears the figure's own value.
import { useId } from 'react';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import type { HouseStyle } from '../../../../shared/spec/house-style';
import { describeSetting, SETTING_NAMES } from '../utils/house-style-overrides';
import { DPI_CHOICES, pixelsFor, SIZE_PRESETS } from '../utils/print-size';
import { patchLook, patchPrint } from '../utils/spec-edits';
import type { EditSpec } from '../utils/spec-history';
import { ChoiceField } from './choice-field';
import { ControlGroup } from './control-group';
import { InheritedSetting } from './inherited-setting';
import { NumberField } from './number-field';

type Look = HouseStyle['look'];
type Print = HouseStyle['print'];

interface Props {
  spec: FigureSpec;
  houseStyle: HouseStyle;
  onEdit: EditSpec;
  readOnly: boolean;
}

function ColourInput({
  label,
  value,
  onChange,
  disabled,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
  disabled: boolean;
}) {
  const id = useId();
  return (
    <div className="flex items-center justify-between gap-3">
      <label htmlFor={id} className="text-sm font-semibold text-stone-800">
        {label}
      </label>
      <span className="flex items-center gap-2">
        <span className="font-mono text-xs text-stone-600">{value}</span>
        <input
          id={id}
          type="color"
          value={value}
          disabled={disabled}
          onChange={(e) => onChange(e.target.value)}
          className="h-8 w-12 cursor-pointer rounded border border-stone-300 bg-white p-0.5"
        />
      </span>
    </div>
  );
}

export function LookControls({ spec, houseStyle, onEdit, readOnly }: Props) {
  const resolved: Look = { ...houseStyle.look, ...spec.look } as Look;
  function setting<K extends keyof Look>(
    key: K,
    control: (value: Look[K], set: (v: Look[K]) => void) => React.ReactNode,
  ) {
    const set = (v: Look[K]) => onEdit(patchLook(spec, { [key]: v }), `look.${key}`);
    return (
      <InheritedSetting
        key={key}
        name={SETTING_NAMES[key]}
        houseValue={describeSetting(key, houseStyle.look[key])}
        own={spec.look[key] !== undefined}
        disabled={readOnly}
        onOwn={() => set(houseStyle.look[key])}
        onInherit={() => onEdit(patchLook(spec, { [key]: undefined }), `look.${key}`)}
      >
        {control(resolved[key], set)}
      </InheritedSetting>
    );
  }
  const toggle = (
    key: 'showAxes' | 'showScaleBar' | 'showNodalSurfaces' | 'showLabel',
    label: string,
  ) =>
    setting(key, (v, set) => (
      <CheckboxField
        label={label}
        checked={v}
        disabled={readOnly}
        onChange={(e) => set(e.target.checked)}
      />
    ));

  return (
    <div className="space-y-4">
      <ControlGroup
        legend="Colours"
        note="Phase colours should differ in lightness as well as hue, so the phases survive greyscale print."
      >
        {setting('positiveColour', (v, set) => (
          <ColourInput label="Positive phase colour" value={v} onChange={set} disabled={readOnly} />
        ))}
        {setting('negativeColour', (v, set) => (
          <ColourInput label="Negative phase colour" value={v} onChange={set} disabled={readOnly} />
        ))}
        {setting('opacity', (v, set) => (
          <NumberField
            label="Opacity"
            unit="%"
            value={Math.round(v * 100)}
            min={5}
            max={100}
            integer
            disabled={readOnly}
            onChange={(p) => set(p / 100)}
          />
        ))}
      </ControlGroup>
      <ControlGroup legend="What is drawn">
        {toggle('showAxes', 'Show axes')}
        {toggle('showScaleBar', 'Show scale bar')}
        {toggle('showNodalSurfaces', 'Show nodal surfaces')}
        {toggle('showLabel', 'Show label')}
        {setting('label', (v, set) => {
          return <LabelInput value={v} onChange={set} disabled={readOnly} />;
        })}
      </ControlGroup>
      <ControlGroup legend="Type and lines">
        {setting('fontSizePt', (v, set) => (
          <NumberField
            label="Font size"
            unit="pt"
            value={v}
            min={5}
            max={24}
            step={0.5}
            disabled={readOnly}
            onChange={set}
          />
        ))}
        {setting('lineWidthPt', (v, set) => (
          <NumberField
            label="Line width"
            unit="pt"
            value={v}
            min={0.1}
            max={4}
            step={0.05}
            disabled={readOnly}
            onChange={set}
          />
        ))}
      </ControlGroup>
    </div>
  );
}

function LabelInput({
  value,
  onChange,
  disabled,
}: {
  value: string;
  onChange: (v: string) => void;
  disabled: boolean;
}) {
  const id = useId();
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-stone-800">
        Label text
      </label>
      <input
        id={id}
        type="text"
        maxLength={80}
        value={value}
        disabled={disabled}
        placeholder="The orbital’s name"
        aria-describedby={`${id}-hint`}
        onChange={(e) => onChange(e.target.value)}
        className="block w-full rounded-md border border-stone-300 bg-white px-2.5 py-1.5 text-sm shadow-xs"
      />
      <p id={`${id}-hint`} className="text-xs text-stone-600">
        Empty: the conventional orbital name.
      </p>
    </div>
  );
}

export function PrintControls({ spec, houseStyle, onEdit, readOnly }: Props) {
  const resolved: Print = { ...houseStyle.print, ...spec.print } as Print;
  function setting<K extends keyof Print>(
    key: K,
    control: (value: Print[K], set: (v: Print[K]) => void) => React.ReactNode,
  ) {
    const set = (v: Print[K]) => onEdit(patchPrint(spec, { [key]: v }), `print.${key}`);
    return (
      <InheritedSetting
        key={key}
        name={SETTING_NAMES[key]}
        houseValue={describeSetting(key, houseStyle.print[key])}
        own={spec.print[key] !== undefined}
        disabled={readOnly}
        onOwn={() => set(houseStyle.print[key])}
        onInherit={() => onEdit(patchPrint(spec, { [key]: undefined }), `print.${key}`)}
      >
        {control(resolved[key], set)}
      </InheritedSetting>
    );
  }
  return (
    <div className="space-y-4">
      <ControlGroup legend="Size on the page">
        {readOnly ? null : (
          <div className="flex flex-wrap gap-2" role="group" aria-label="Page size presets">
            {SIZE_PRESETS.map((p) => (
              <Button
                key={p.name}
                size="sm"
                aria-pressed={resolved.widthMm === p.widthMm && resolved.heightMm === p.heightMm}
                onClick={() =>
                  onEdit(
                    patchPrint(spec, { widthMm: p.widthMm, heightMm: p.heightMm }),
                    'print.size',
                  )
                }
              >
                {p.name} ({p.widthMm} × {p.heightMm} mm)
              </Button>
            ))}
          </div>
        )}
        {setting('widthMm', (v, set) => (
          <NumberField
            label="Width"
            unit="mm"
            value={v}
            min={10}
            max={500}
            step={1}
            disabled={readOnly}
            onChange={set}
          />
        ))}
        {setting('heightMm', (v, set) => (
          <NumberField
            label="Height"
            unit="mm"
            value={v}
            min={10}
            max={500}
            step={1}
            disabled={readOnly}
            onChange={set}
          />
        ))}
      </ControlGroup>
      <ControlGroup legend="Output">
        {setting('dpi', (v, set) => (
          <NumberField
            label="Resolution"
            unit="dpi"
            value={v}
            min={72}
            max={1200}
            integer
            step={50}
            disabled={readOnly}
            hint={`Common: ${DPI_CHOICES.join(', ')}. At this size: ${pixelsFor(resolved.widthMm, v)} × ${pixelsFor(resolved.heightMm, v)} px.`}
            onChange={set}
          />
        ))}
        {setting('background', (v, set) => (
          <ChoiceField
            label="Background"
            value={v}
            disabled={readOnly}
            choices={[
              { value: 'transparent', label: 'Transparent' },
              { value: 'white', label: 'White' },
            ]}
            onChange={set}
          />
        ))}
        {setting('formats', (v, set) => (
          <fieldset>
            <legend className="text-sm font-semibold text-stone-800">Formats for exports</legend>
            <div className="mt-1 flex flex-wrap gap-3">
              {(['png', 'tiff', 'pdf', 'svg'] as const).map((f) => (
                <CheckboxField
                  key={f}
                  label={f.toUpperCase()}
                  checked={v.includes(f)}
                  // The schema needs at least one format: the last one cannot be unticked.
                  disabled={readOnly || (v.length === 1 && v.includes(f))}
                  onChange={(e) => set(e.target.checked ? [...v, f] : v.filter((x) => x !== f))}
                />
              ))}
            </div>
          </fieldset>
        ))}
      </ControlGroup>
    </div>
  );
}
