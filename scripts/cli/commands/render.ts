// `scripts/lobewright render`: { "spec", "format", "out"?, "houseStyle"?, "cmyk"? } → the print file,
// written to "out" (answering a JSON summary) or to standard output as bytes. No server needed.
import { createHash } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import { z } from 'zod';
import { closeRender3d } from '../../../api/render/render-3d';
import { renderFigure, renderFormats } from '../../../api/render/render-figure';
import { checkRenderLimits } from '../../../api/services/render-service';
import { AppError } from '../../../api/lib/app-error';
import { houseStyleInputSchema, parseHouseStyle } from '../../../shared/spec/house-style';
import { migrateFigureSpec, SpecVersionError } from '../../../shared/spec/migrate-figure-spec';
import { resolveFigureSpec } from '../../../shared/spec/resolve-figure-spec';
import { CliError, type CliCommand } from '../cli-error';
import { FigureSpecError } from '../../../shared/figures/figure-error';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';

const requestSchema = z.object({
  spec: z.unknown(),
  format: z.enum(renderFormats),
  out: z.string().min(1).optional(),
  houseStyle: houseStyleInputSchema.optional(),
  cmyk: z.boolean().default(false),
});

function firstIssue(err: z.ZodError, prefix: string): CliError {
  const issue = err.issues[0];
  const field = [prefix, ...issue.path.map(String)].filter(Boolean).join('.');
  return new CliError(field || prefix, `${field}: ${issue.message}`);
}

const render: CliCommand = async (raw) => {
  const parsed = requestSchema.safeParse(raw);
  if (!parsed.success) throw firstIssue(parsed.error, '');
  const req = parsed.data;
  let spec;
  try {
    spec = migrateFigureSpec(req.spec);
  } catch (err) {
    if (err instanceof z.ZodError) throw firstIssue(err, 'spec');
    if (err instanceof SpecVersionError) throw new CliError('spec.schemaVersion', err.message);
    throw err;
  }
  const resolved = resolveFigureSpec(spec, parseHouseStyle(req.houseStyle ?? {}));
  try {
    checkRenderLimits(resolved, req.format);
    const file = await renderFigure(resolved, req.format, { cmyk: req.cmyk });
    if (!req.out) return new Uint8Array(file.bytes);
    writeFileSync(req.out, file.bytes);
    return {
      out: req.out,
      format: req.format,
      bytes: file.bytes.length,
      sha256: createHash('sha256').update(file.bytes).digest('hex'),
      notes: file.notes,
      facts: file.facts,
    };
  } catch (err) {
    if (err instanceof FigureSpecError || err instanceof OrbitalInputError) {
      throw new CliError(`spec.${err.field}`, err.message, 'cannot_draw');
    }
    if (err instanceof AppError) {
      const field = Object.keys(err.fields ?? {})[0] ?? 'spec';
      throw new CliError(field.startsWith('print') || field.startsWith('kind') ? `spec.${field}` : field, err.message, err.code);
    }
    throw err;
  } finally {
    await closeRender3d();
  }
};

export default render;
