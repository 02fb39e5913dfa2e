// Gives the ids inside a generated SVG a prefix, so two copies of a figure on one page (preview
// and print preview) do not share clip paths or titles.
export function scopeSvgIds(svg: string, prefix: string): string {
  return svg
    .replace(/\bid="([^"]+)"/g, `id="${prefix}$1"`)
    .replace(/url\(#([^)]+)\)/g, `url(#${prefix}$1)`)
    .replace(
      /aria-labelledby="([^"]+)"/g,
      (_, ids: string) =>
        `aria-labelledby="${ids
          .split(' ')
          .map((i) => prefix + i)
          .join(' ')}"`,
    )
    .replace(/^<\?xml[^>]*>\s*/, '');
}
