import { PDFParse } from "pdf-parse";

/** The text of each page of a PDF, read back the way a reader's viewer would (pdf-parse). */
export async function pdfPages(bytes: ArrayBuffer | Uint8Array): Promise<string[]> {
  const parser = new PDFParse({ data: bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes) });
  try {
    const r = await parser.getText();
    return r.pages.map((p) => p.text);
  } finally {
    await parser.destroy();
  }
}
