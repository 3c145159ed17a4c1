/** What a stored file is, in words, from its media type. */
const KIND_NAMES: Record<string, string> = {
  "application/pdf": "PDF",
  "image/png": "PNG image",
  "image/svg+xml": "SVG image",
  "application/json": "JSON",
  "text/csv": "CSV",
};

export const kindName = (mediaType: string) => KIND_NAMES[mediaType] ?? mediaType;
