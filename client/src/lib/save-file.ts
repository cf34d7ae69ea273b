/** Offers a blob to the browser as a file download under `fileName`. */
export function saveFile(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Revoked on the next turn, once the browser has started the download.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
