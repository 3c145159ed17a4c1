/** A file's size as people read it: bytes below a kilobyte, then kB and MB (powers of 1024, as file managers show). */
export function fileSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(bytes < 10 * 1024 ? 1 : 0)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

const KIND_NAMES: Record<string, string> = {
  "application/pdf": "PDF",
  "image/png": "PNG image",
  "image/svg+xml": "SVG image",
  "application/json": "JSON",
  "text/csv": "CSV",
};

export const kindName = (mediaType: string) => KIND_NAMES[mediaType] ?? mediaType;
