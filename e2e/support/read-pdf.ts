import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

/** One page of a PDF as Mozilla's PDF.js (npm pdfjs-dist) reads it: size in points, text runs. */
export type PdfPage = { widthPt: number; heightPt: number; items: string[] };

/**
 * Reads a PDF with PDF.js — an independent parser, not the browser that wrote it: each page's
 * size from its view box (PDF user space units, 1/72 in, ISO 32000-1 §8.3.2.3) and its text
 * items (runs of text, trimmed, empty ones left out).
 */
export async function readPdf(bytes: Uint8Array): Promise<PdfPage[]> {
  const pdf = await getDocument({
    data: new Uint8Array(bytes),
    useSystemFonts: false,
    disableFontFace: true,
    isEvalSupported: false,
  }).promise;
  const pages: PdfPage[] = [];
  for (let n = 1; n <= pdf.numPages; n += 1) {
    const page = await pdf.getPage(n);
    const [x0, y0, x1, y1] = page.view;
    const content = await page.getTextContent();
    const items = content.items
      .flatMap((item) => ("str" in item ? [item.str.trim()] : []))
      .filter((s) => s !== "");
    pages.push({ widthPt: (x1 ?? 0) - (x0 ?? 0), heightPt: (y1 ?? 0) - (y0 ?? 0), items });
  }
  await pdf.destroy();
  return pages;
}

/** A page's text with every space and line break taken out, for finding words across runs. */
export function squeezed(page: PdfPage): string {
  return page.items.join("").replace(/\s+/g, "");
}

/** Text with its spaces and line breaks taken out. */
export function squeeze(text: string): string {
  return text.replace(/\s+/g, "");
}
