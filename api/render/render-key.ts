// What identifies a rendered file: the resolved spec, the format, the CMYK choice and the renderer
// version, hashed (SHA-256 of canonical JSON). The same key always means the same bytes.
import { createHash } from 'node:crypto';
import { canonicalJson } from '../../shared/spec/canonical-json';
import type { FigureDatasets } from '../../shared/figures/radial-datasets';
import type { ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';

export const renderFormats = ['png', 'tiff', 'pdf', 'svg'] as const;
export type RenderFormat = (typeof renderFormats)[number];

/** Bumped whenever a change to the renderers changes output bytes (part of every cache key). */
export const RENDERER_VERSION = 'lobewright-render-1';

/** `datasets`: the uploaded points the figure draws (absent for figures that draw none, keeping their keys). */
export function renderKey(spec: ResolvedFigureSpec, format: RenderFormat, cmyk: boolean, datasets?: FigureDatasets): string {
  const identity = { spec, format, cmyk, renderer: RENDERER_VERSION, ...(datasets ? { datasets } : {}) };
  return createHash('sha256').update(canonicalJson(identity)).digest('hex');
}
