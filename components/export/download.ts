/** Hands a file to the browser's downloads, from text or from a data URL. */

function clickLink(href: string, fileName: string): void {
  const link = document.createElement("a");
  link.href = href;
  link.download = fileName;
  link.rel = "noopener";
  document.body.appendChild(link);
  link.click();
  link.remove();
}

export function downloadText(fileName: string, text: string, mediaType: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: `${mediaType};charset=utf-8` }));
  clickLink(url, fileName);
  // Give the download a moment to start before the URL goes.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function downloadDataUrl(fileName: string, dataUrl: string): void {
  clickLink(dataUrl, fileName);
}

export function downloadBytes(fileName: string, bytes: Uint8Array, mediaType: string): void {
  const url = URL.createObjectURL(new Blob([bytes as BlobPart], { type: mediaType }));
  clickLink(url, fileName);
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
