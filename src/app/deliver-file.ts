/**
 * Hand a file to the person: through the share sheet where the browser can share files (the
 * only way out of an installed iOS app, which has no downloads), or as a download through an
 * <a download> link with a Blob URL. Sharing must run straight from a tap: call `shareFile`
 * synchronously in the click handler, with a file prepared beforehand.
 */

/** True when this browser can share this file through the share sheet. */
export function canShareFile(file: File): boolean {
  return typeof navigator.canShare === 'function' && navigator.canShare({ files: [file] });
}

/** Share the file; resolves true when shared, false when the person cancelled. */
export async function shareFile(file: File): Promise<boolean> {
  try {
    await navigator.share({ files: [file] });
    return true;
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') return false;
    throw error;
  }
}

/** Start a download of the file. */
export function downloadFile(file: File): void {
  const url = URL.createObjectURL(file);
  const link = document.createElement('a');
  link.href = url;
  link.download = file.name;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser time to start reading the Blob before letting it go.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
