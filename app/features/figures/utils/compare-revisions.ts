// What a saved revision holds differently from the figure's latest revision, in the words the
// page uses for each part. The spec is compared by its fingerprint (specHash) from the server.
import type { Figure, Revision } from '../../../../shared/api/schemas';

const PARTS = [
  ['number', 'number'],
  ['title', 'title'],
  ['caption', 'caption'],
  ['altText', 'alt text'],
] as const;

export function revisionDifferences(
  revision: Revision,
  latest: Figure,
  latestSpecHash: string | undefined,
): string[] {
  const differing: string[] = PARTS.filter(([key]) => revision[key] !== latest[key]).map(
    ([, name]) => name,
  );
  if (latestSpecHash !== undefined && revision.specHash !== latestSpecHash)
    differing.push('what the figure shows');
  return differing;
}
