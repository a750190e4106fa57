/** Saves a Blob under a file name through a temporary link, as a download. */
export function saveFile(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Some browsers read the URL after click() returns; revoke it a little later.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
