// GET /api/figures/:figureId/render: a saved revision as a print file (PNG, TIFF, PDF, SVG), with
// the server's cautions from the X-Lobewright-Notes header (URI-encoded JSON list of strings).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { ApiError } from '../../../lib/api-client';
import { apiErrorSchema, exportFormatSchema } from '../../../../shared/api/schemas';

export type RenderFormat = z.infer<typeof exportFormatSchema>;

export interface RenderRequest {
  format: RenderFormat;
  revision: number;
  cmyk?: boolean;
  download?: boolean;
}

export interface RenderedFile {
  blob: Blob;
  filename: string;
  contentType: string;
  notes: string[];
}

const notesSchema = z.array(z.string());

export function renderUrl(figureId: number, r: RenderRequest): string {
  const q = new URLSearchParams({ format: r.format, revision: String(r.revision) });
  if (r.cmyk) q.set('cmyk', 'true');
  if (r.download) q.set('download', 'true');
  return `/api/figures/${figureId}/render?${q.toString()}`;
}

/** The cautions a render answer carries; a header that does not parse is an unexpected answer. */
export function parseNotesHeader(header: string | null): string[] {
  if (!header) return [];
  const parsed = notesSchema.safeParse(JSON.parse(decodeURIComponent(header)));
  if (!parsed.success)
    throw new ApiError(0, 'unexpected_response', 'X-Lobewright-Notes: not a list of notes');
  return parsed.data;
}

function filenameOf(disposition: string | null, fallback: string): string {
  const match = /filename="([^"]+)"/.exec(disposition ?? '');
  return match ? match[1] : fallback;
}

export async function getRender(
  figureId: number,
  r: RenderRequest,
  signal?: AbortSignal,
): Promise<RenderedFile> {
  const response = await fetch(renderUrl(figureId, r), { credentials: 'same-origin', signal });
  if (!response.ok) {
    const body = apiErrorSchema.safeParse(await response.json().catch(() => null));
    if (body.success)
      throw new ApiError(
        response.status,
        body.data.error.code,
        body.data.error.message,
        body.data.error.fields ?? {},
      );
    throw new ApiError(
      response.status,
      'render_failed',
      `The print file could not be made (HTTP ${response.status}).`,
    );
  }
  const contentType = response.headers.get('content-type') ?? 'application/octet-stream';
  return {
    blob: await response.blob(),
    contentType,
    filename: filenameOf(
      response.headers.get('content-disposition'),
      `figure-${figureId}.${r.format}`,
    ),
    notes: parseNotesHeader(response.headers.get('x-lobewright-notes')),
  };
}

export function getRenderQueryOptions(figureId: number, r: RenderRequest) {
  return queryOptions({
    queryKey: [
      'figures',
      'render',
      figureId,
      r.revision,
      r.format,
      Boolean(r.cmyk),
      Boolean(r.download),
    ] as const,
    queryFn: ({ signal }) => getRender(figureId, r, signal),
    // A revision's print file never changes unless the house style does; keep it a while.
    staleTime: 5 * 60_000,
    retry: false,
  });
}

export function useRender(figureId: number, r: RenderRequest, enabled = true) {
  return useQuery({ ...getRenderQueryOptions(figureId, r), enabled });
}
