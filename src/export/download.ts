/** Hands a blob to the browser as a file download, and names export files after the design. */

/** A file name stem from the design's title and revision, e.g. `blanket-chest-r4`. */
export function exportFileStem(title: string, revision: number): string {
  const slug = title.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60);
  return `${slug || 'design'}-r${revision}`;
}

/** Starts the download of `blob` as `fileName`. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  // The browser has taken its copy once the click's task is done; free the URL a little later.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
