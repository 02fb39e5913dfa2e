// Upload of a radial data CSV: the file is checked in the browser with the server's own parser, so
// line-numbered problems show before sending; units are chosen only when the header states none.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import { MAX_ROWS } from '../../../../shared/data/parse-radial-csv';
import {
  radialDataQuantities,
  radialLengthUnits,
  valueUnitsFor,
} from '../../../../shared/data/radial-data-units';
import { MAX_DATASET_FILE_BYTES } from '../../../../shared/api/datasets';
import { useUploadDataset } from '../api/upload-dataset';
import { checkCsv, problemsFromError, problemText, type CsvCheck } from '../utils/csv-problems';

const QUANTITY_WORDS = {
  R: 'R (radial function)',
  r2R2: 'r²R² (radial distribution)',
  potential: 'V (potential)',
};

const stemOf = (f: File | null) => (f ? f.name.replace(/\.(csv|txt)$/i, '') : '');

export function DatasetUploadForm({ projectId }: { projectId: number }) {
  const upload = useUploadDataset(projectId);
  const [file, setFile] = useState<File | null>(null);
  const [text, setText] = useState<string | null>(null);
  const [name, setName] = useState('');
  const [rUnit, setRUnit] = useState('');
  const [valueUnit, setValueUnit] = useState('');
  const [nameError, setNameError] = useState<string | undefined>();
  const [saved, setSaved] = useState<string | null>(null);

  const options = { rUnit: rUnit || undefined, valueUnit: valueUnit || undefined };
  const check: CsvCheck | null = text === null ? null : checkCsv(text, options);
  const serverProblems = problemsFromError(upload.error);
  const problems = check?.problems.length ? check.problems : serverProblems;
  const unitProblem = (field: 'rUnit' | 'valueUnit') =>
    problems.find((p) => p.field === field)?.message;
  const tooLarge = file !== null && file.size > MAX_DATASET_FILE_BYTES;

  async function chooseFile(f: File | null) {
    setFile(f);
    setSaved(null);
    upload.reset();
    setText(f && f.size <= MAX_DATASET_FILE_BYTES ? await f.text() : null);
    // The name follows the file until the person types one of their own.
    if (f && (!name || name === stemOf(file))) setName(stemOf(f));
  }

  function submit(e: FormEvent) {
    e.preventDefault();
    setSaved(null);
    if (!name.trim()) return setNameError('give the data set a name');
    setNameError(undefined);
    if (!file || !check?.data) return;
    upload.mutate(
      { file, name, ...options },
      {
        onSuccess: (d) => {
          setSaved(`Stored “${d.name}”: ${d.points} points.`);
          setFile(null);
          setText(null);
          setName('');
          (e.target as HTMLFormElement).reset();
        },
      },
    );
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <div className="space-y-1">
        <label htmlFor="dataset-file" className="block text-sm font-semibold text-stone-800">
          CSV file
        </label>
        <input
          id="dataset-file"
          type="file"
          accept=".csv,text/csv,text/plain"
          aria-describedby="dataset-file-hint dataset-problems"
          aria-invalid={problems.some((p) => p.field === 'file') || tooLarge || undefined}
          onChange={(e) => void chooseFile(e.target.files?.[0] ?? null)}
          className="block text-sm"
        />
        <p id="dataset-file-hint" className="text-xs text-stone-600">
          A header such as <code>r / pm, R / pm^-3/2</code> or <code>r_bohr,V_eV</code>, then one
          “r, value” pair per line; r increasing; up to {MAX_ROWS.toLocaleString('en-GB')} rows.
        </p>
      </div>
      <TextField
        label="Name"
        value={name}
        maxLength={120}
        onChange={(e) => setName(e.target.value)}
        error={nameError ?? (isApiError(upload.error) ? upload.error.fields.name : undefined)}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Unit of r"
          hint="Only when the header states none."
          value={rUnit}
          onChange={(e) => setRUnit(e.target.value)}
          error={unitProblem('rUnit')}
        >
          <option value="">(as in the header)</option>
          {radialLengthUnits.map((u) => (
            <option key={u}>{u}</option>
          ))}
        </SelectField>
        <SelectField
          label="Unit of the values"
          hint="Only when the header states none."
          value={valueUnit}
          onChange={(e) => setValueUnit(e.target.value)}
          error={unitProblem('valueUnit')}
        >
          <option value="">(as in the header)</option>
          {radialDataQuantities.map((q) => (
            <optgroup key={q} label={QUANTITY_WORDS[q]}>
              {valueUnitsFor(q).map((u) => (
                <option key={u}>{u}</option>
              ))}
            </optgroup>
          ))}
        </SelectField>
      </div>
      <div id="dataset-problems">
        {tooLarge && <FormAlert message="this file is larger than 2 MB" />}
        {problems.length > 0 && (
          <div
            role="alert"
            className="rounded-md border border-red-200 bg-red-50 px-3 py-2 text-sm text-red-800"
          >
            <p className="font-semibold">The file cannot be stored as it is:</p>
            <ul className="mt-1 list-disc pl-5">
              {problems.map((p, i) => (
                <li key={i}>{problemText(p)}</li>
              ))}
            </ul>
          </div>
        )}
        {check?.data && (
          <p role="status" className="text-sm text-stone-700">
            {check.data.r.length} points of {QUANTITY_WORDS[check.data.quantity]}, r in{' '}
            {check.data.rUnit}, values in {check.data.valueUnit}; stored in atomic units.
          </p>
        )}
      </div>
      {upload.isError && serverProblems.length === 0 && (
        <FormAlert message={upload.error.message} />
      )}
      {saved && <SavedNote>{saved}</SavedNote>}
      <Button
        type="submit"
        variant="primary"
        busy={upload.isPending}
        disabled={!check?.data || tooLarge}
      >
        {upload.isPending ? 'Uploading…' : 'Upload data'}
      </Button>
    </form>
  );
}
