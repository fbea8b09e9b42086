/** A file fetched for download: its contents and the name to save it under. */
export interface DownloadedFile {
  readonly blob: Blob;
  readonly fileName: string;
}

/** Hands `blob` to the browser as a download called `fileName`. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  document.body.append(link);
  link.click();
  link.remove();
  // Revoke later: some browsers read the URL after click() returns.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** The file name in a `Content-Disposition` header, or `fallback`. */
export function attachmentFileName(header: string | null, fallback: string): string {
  const match = header ? /filename\*?=(?:UTF-8'')?"?([^";]+)"?/i.exec(header) : null;
  return match?.[1] ? decodeURIComponent(match[1]) : fallback;
}
