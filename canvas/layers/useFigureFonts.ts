"use client";

/**
 * Canvas text cannot read CSS variables, so the figure fonts are looked up once from the page's --font-* variables
 * (set by next/font) and the figures redraw when the web fonts have loaded.
 */
import { useEffect, useState } from "react";

export interface FigureFonts {
  serif: string;
  mono: string;
  sans: string;
}

const FALLBACK: FigureFonts = { serif: "Georgia, serif", mono: "ui-monospace, monospace", sans: "system-ui, sans-serif" };

function readFonts(): FigureFonts {
  const style = getComputedStyle(document.documentElement);
  const read = (name: string, fallback: string) => {
    const value = style.getPropertyValue(name).trim();
    return value ? `${value}, ${fallback}` : fallback;
  };
  return { serif: read("--font-serif", FALLBACK.serif), mono: read("--font-mono", FALLBACK.mono), sans: read("--font-sans", FALLBACK.sans) };
}

export function useFigureFonts(): FigureFonts {
  const [fonts, setFonts] = useState<FigureFonts>(FALLBACK);
  useEffect(() => {
    let live = true;
    setFonts(readFonts());
    document.fonts?.ready.then(() => live && setFonts(readFonts()));
    return () => {
      live = false;
    };
  }, []);
  return fonts;
}
