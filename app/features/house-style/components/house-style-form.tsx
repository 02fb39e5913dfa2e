// The project's house style for owners: phase colours, line and type sizes, what every figure
// shows, and the print size, resolution, background and file formats figures inherit.
import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { SelectField, TextField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { sentence } from '../../../utils/sentence';
import {
  COLUMN_WIDTHS_MM,
  houseStyleInputSchema,
  type HouseStyle,
} from '../../../../shared/spec/house-style';
import { useUpdateHouseStyle } from '../api/update-house-style';

type Format = HouseStyle['print']['formats'][number];
const FORMATS: Format[] = ['png', 'tiff', 'pdf', 'svg'];
const FIELDS = ['look.positiveColour', 'look.negativeColour', 'print.background', 'print.formats'];

const WIDTH_PRESETS = [
  { label: 'Single column', mm: COLUMN_WIDTHS_MM.single },
  { label: 'Double column', mm: COLUMN_WIDTHS_MM.double },
  { label: 'Slide', mm: COLUMN_WIDTHS_MM.slide },
];

type NumberKey = 'opacity' | 'fontSizePt' | 'lineWidthPt' | 'widthMm' | 'heightMm' | 'dpi';
type ToggleKey = 'showAxes' | 'showScaleBar' | 'showNodalSurfaces' | 'showLabel';

interface NumberFieldSpec {
  key: NumberKey;
  /** Dotted path of the field in the request, as the server names it in errors. */
  path: string;
  label: string;
  min: number;
  max: number;
  step: number;
  hint: string;
}

// Limits as in shared/spec/figure-spec.ts (lookSchema, printSchema).
const LOOK_NUMBERS: NumberFieldSpec[] = [
  {
    key: 'opacity',
    path: 'look.opacity',
    label: 'Opacity',
    min: 0.05,
    max: 1,
    step: 0.05,
    hint: '0.05 to 1',
  },
  {
    key: 'fontSizePt',
    path: 'look.fontSizePt',
    label: 'Type size (pt)',
    min: 5,
    max: 24,
    step: 0.5,
    hint: '5 to 24 pt',
  },
  {
    key: 'lineWidthPt',
    path: 'look.lineWidthPt',
    label: 'Line width (pt)',
    min: 0.1,
    max: 4,
    step: 0.05,
    hint: '0.1 to 4 pt',
  },
];
const PRINT_NUMBERS: NumberFieldSpec[] = [
  {
    key: 'widthMm',
    path: 'print.widthMm',
    label: 'Width (mm)',
    min: 10,
    max: 500,
    step: 1,
    hint: '10 to 500 mm',
  },
  {
    key: 'heightMm',
    path: 'print.heightMm',
    label: 'Height (mm)',
    min: 10,
    max: 500,
    step: 1,
    hint: '10 to 500 mm',
  },
  {
    key: 'dpi',
    path: 'print.dpi',
    label: 'Resolution (dpi)',
    min: 72,
    max: 1200,
    step: 1,
    hint: '300 for shaded figures, 600 for line art',
  },
];
const TOGGLES: Array<{ key: ToggleKey; label: string }> = [
  { key: 'showAxes', label: 'Axes' },
  { key: 'showScaleBar', label: 'Scale bar' },
  { key: 'showNodalSurfaces', label: 'Nodal surfaces' },
  { key: 'showLabel', label: 'Orbital label' },
];

/** Numbers are edited as text so that a half-typed value is not lost; the schema checks them. */
interface Draft {
  positiveColour: string;
  negativeColour: string;
  opacity: string;
  fontSizePt: string;
  lineWidthPt: string;
  showAxes: boolean;
  showScaleBar: boolean;
  showNodalSurfaces: boolean;
  showLabel: boolean;
  widthMm: string;
  heightMm: string;
  dpi: string;
  background: HouseStyle['print']['background'];
  formats: Format[];
}

function draftOf({ look, print }: HouseStyle): Draft {
  return {
    positiveColour: look.positiveColour,
    negativeColour: look.negativeColour,
    opacity: String(look.opacity),
    fontSizePt: String(look.fontSizePt),
    lineWidthPt: String(look.lineWidthPt),
    showAxes: look.showAxes,
    showScaleBar: look.showScaleBar,
    showNodalSurfaces: look.showNodalSurfaces,
    showLabel: look.showLabel,
    widthMm: String(print.widthMm),
    heightMm: String(print.heightMm),
    dpi: String(print.dpi),
    background: print.background,
    formats: print.formats,
  };
}

/** Empty text stays NaN so that the schema reports the field instead of storing 0. */
const numberFrom = (text: string) => (text.trim() === '' ? Number.NaN : Number(text));

function requestOf(d: Draft, style: HouseStyle) {
  return {
    look: {
      ...style.look,
      positiveColour: d.positiveColour,
      negativeColour: d.negativeColour,
      opacity: numberFrom(d.opacity),
      fontSizePt: numberFrom(d.fontSizePt),
      lineWidthPt: numberFrom(d.lineWidthPt),
      showAxes: d.showAxes,
      showScaleBar: d.showScaleBar,
      showNodalSurfaces: d.showNodalSurfaces,
      showLabel: d.showLabel,
    },
    print: {
      widthMm: numberFrom(d.widthMm),
      heightMm: numberFrom(d.heightMm),
      dpi: numberFrom(d.dpi),
      background: d.background,
      formats: d.formats,
    },
  };
}

function ColourField({
  label,
  value,
  onChange,
  error,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
  error?: string;
}) {
  const id = useId();
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-stone-800">
        {label}
      </label>
      <div className="flex items-center gap-3">
        <input
          id={id}
          type="color"
          value={value}
          onChange={(e) => onChange(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-value`}
          className="h-9 w-14 cursor-pointer rounded-md border border-stone-300 bg-white p-1"
        />
        <span id={`${id}-value`} className="font-mono text-sm text-stone-700">
          {value}
        </span>
      </div>
      {error && <p className="text-sm text-red-700">{sentence(error)}</p>}
    </div>
  );
}

export function HouseStyleForm({ projectId, style }: { projectId: number; style: HouseStyle }) {
  const update = useUpdateHouseStyle(projectId);
  const { errors, submit } = useValidatedSubmit(houseStyleInputSchema, update);
  const [draft, setDraft] = useState<Draft>(() => draftOf(style));
  const [saved, setSaved] = useState(false);

  const set = <K extends keyof Draft>(key: K, value: Draft[K]) => {
    setSaved(false);
    setDraft((d) => ({ ...d, [key]: value }));
  };
  const toggleFormat = (format: Format, on: boolean) =>
    set(
      'formats',
      on
        ? FORMATS.filter((f) => f === format || draft.formats.includes(f))
        : draft.formats.filter((f) => f !== format),
    );

  const numberFields = (fields: NumberFieldSpec[]) => (
    <div className="grid gap-4 sm:grid-cols-3">
      {fields.map((f) => (
        <TextField
          key={f.key}
          label={f.label}
          type="number"
          inputMode="decimal"
          min={f.min}
          max={f.max}
          step={f.step}
          value={draft[f.key]}
          onChange={(e) => set(f.key, e.target.value)}
          error={errors[f.path]}
          hint={f.hint}
        />
      ))}
    </div>
  );

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit(requestOf(draft, style), (savedStyle) => {
      setDraft(draftOf(savedStyle));
      setSaved(true);
    });
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6" aria-label="House style">
      <FormAlert
        message={formErrorMessage(update.error, [
          ...FIELDS,
          ...[...LOOK_NUMBERS, ...PRINT_NUMBERS].map((f) => f.path),
        ])}
      />
      <fieldset className="space-y-4">
        <legend className="mb-2 text-base font-semibold">Look</legend>
        <div className="flex flex-wrap gap-8">
          <ColourField
            label="Positive phase colour"
            value={draft.positiveColour}
            onChange={(v) => set('positiveColour', v)}
            error={errors['look.positiveColour']}
          />
          <ColourField
            label="Negative phase colour"
            value={draft.negativeColour}
            onChange={(v) => set('negativeColour', v)}
            error={errors['look.negativeColour']}
          />
        </div>
        {numberFields(LOOK_NUMBERS)}
        <div className="flex flex-wrap gap-x-6 gap-y-2">
          {TOGGLES.map(({ key, label }) => (
            <CheckboxField
              key={key}
              label={label}
              checked={draft[key]}
              onChange={(e) => set(key, e.target.checked)}
            />
          ))}
        </div>
      </fieldset>

      <fieldset className="space-y-4">
        <legend className="mb-2 text-base font-semibold">Print</legend>
        {numberFields(PRINT_NUMBERS)}
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <span className="text-stone-700">Width presets:</span>
          {WIDTH_PRESETS.map((p) => (
            <Button
              key={p.label}
              size="sm"
              onClick={() => set('widthMm', String(p.mm))}
              aria-pressed={numberFrom(draft.widthMm) === p.mm}
            >
              {p.label} ({p.mm} mm)
            </Button>
          ))}
        </div>
        <div className="grid gap-4 sm:grid-cols-3">
          <SelectField
            label="Background"
            value={draft.background}
            onChange={(e) => set('background', e.target.value as Draft['background'])}
            error={errors['print.background']}
          >
            <option value="transparent">Transparent</option>
            <option value="white">White</option>
          </SelectField>
          <fieldset className="sm:col-span-2">
            <legend className="mb-1 text-sm font-semibold text-stone-800">File formats</legend>
            <div className="flex flex-wrap gap-x-6 gap-y-2 pt-2">
              {FORMATS.map((format) => (
                <CheckboxField
                  key={format}
                  label={format.toUpperCase()}
                  checked={draft.formats.includes(format)}
                  onChange={(e) => toggleFormat(format, e.target.checked)}
                />
              ))}
            </div>
            {errors['print.formats'] && (
              <p className="mt-1 text-sm text-red-700">{sentence(errors['print.formats'])}</p>
            )}
          </fieldset>
        </div>
      </fieldset>

      <div className="flex items-center gap-4">
        <Button type="submit" variant="primary" busy={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save house style'}
        </Button>
        {saved && (
          <SavedNote>
            House style saved. Figures that do not set these themselves now use it.
          </SavedNote>
        )}
      </div>
    </form>
  );
}
