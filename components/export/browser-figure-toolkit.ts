/**
 * The Export menu's toolkit (canvas/export/render-figure.ts): the figure fonts fetched once from
 * public/figure-fonts/, opened by fontkit for the outlines, and PNG drawn by the browser's canvas from the SVG with
 * its labels as outlines, so the browser draws exactly the shapes the figure command hands to resvg. Browser only.
 */
import { FIGURE_FONT_FACES, FIGURE_FONTS_URL_PATH } from "@/canvas/export/figure-fonts";
import type { FigureToolkit } from "@/canvas/export/render-figure";
import { openOutlineFonts } from "@/canvas/export/text-paths";

async function fetchBytes(url: string): Promise<Uint8Array> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`the figure font ${url} could not be loaded (${response.status})`);
  return new Uint8Array(await response.arrayBuffer());
}

async function rasterise(svg: string, size: { width: number; height: number }, pixelRatio: number): Promise<Uint8Array> {
  const url = URL.createObjectURL(new Blob([svg], { type: "image/svg+xml" }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const canvas = document.createElement("canvas");
    canvas.width = Math.round(size.width * pixelRatio);
    canvas.height = Math.round(size.height * pixelRatio);
    const context = canvas.getContext("2d");
    if (!context) throw new Error("this browser gives no 2D canvas");
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
    if (!blob) throw new Error("the canvas could not be written as PNG");
    return new Uint8Array(await blob.arrayBuffer());
  } finally {
    URL.revokeObjectURL(url);
  }
}

let loading: Promise<FigureToolkit> | null = null;

/** Loaded on the first export and kept for the page's life (the fonts are about 70 kB). */
export function browserFigureToolkit(): Promise<FigureToolkit> {
  loading ??= Promise.all(FIGURE_FONT_FACES.map((face) => fetchBytes(`${FIGURE_FONTS_URL_PATH}/${face.file}`)))
    .then((fontBytes) => ({ fontBytes, outlines: openOutlineFonts(fontBytes), rasterise }))
    .catch((error) => {
      loading = null;
      throw error;
    });
  return loading;
}
