/// <reference types="node" />
import zlib from 'node:zlib';

/**
 * The text drawn in a PDF made by pdfkit, for tests: reads each object,
 * inflates streams, follows every font's ToUnicode map, and decodes the
 * glyph strings of each TJ operator with the font selected before it.
 */
export function pdfText(pdf: Buffer): string {
  const raw = pdf.toString('latin1');
  const objects = new Map<string, { dict: string; stream?: string }>();
  for (const m of raw.matchAll(/(\d+) 0 obj\s*([\s\S]*?)endobj/g)) {
    const body = m[2];
    const at = body.indexOf('stream');
    let stream: string | undefined;
    if (at >= 0) {
      const start = m.index! + m[0].indexOf(body) + at + body.slice(at).match(/^stream\r?\n/)![0].length;
      const end = raw.indexOf('endstream', start);
      const bytes = pdf.subarray(start, end);
      try {
        stream = /FlateDecode/.test(body.slice(0, at)) ? zlib.inflateSync(bytes).toString('latin1') : bytes.toString('latin1');
      } catch {
        stream = undefined;
      }
    }
    objects.set(m[1], { dict: at >= 0 ? body.slice(0, at) : body, stream });
  }
  // Font resource names (/F1…) to glyph → text maps.
  const fonts = new Map<string, Map<string, string>>();
  for (const { dict } of objects.values()) {
    for (const [, name, ref] of dict.matchAll(/\/(F\d+) (\d+) 0 R/g)) {
      const toUnicode = objects.get(ref)?.dict.match(/\/ToUnicode (\d+) 0 R/)?.[1];
      const cmap = toUnicode ? objects.get(toUnicode)?.stream : undefined;
      if (!cmap || fonts.has(name)) continue;
      const map = new Map<string, string>();
      for (const block of cmap.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
        for (const [, lo, list] of block[1].matchAll(/<([0-9a-f]+)>\s*<[0-9a-f]+>\s*\[([^\]]*)\]/gi)) {
          // A ligature maps to several code units: <0066 0069> is "fi".
          [...list.matchAll(/<([0-9a-f ]+)>/gi)].forEach((d, i) =>
            map.set((parseInt(lo, 16) + i).toString(16).padStart(4, '0'), String.fromCharCode(...d[1].trim().split(/\s+/).map((u) => parseInt(u, 16)))),
          );
        }
      }
      fonts.set(name, map);
    }
  }
  const lines: string[] = [];
  for (const { stream } of objects.values()) {
    if (!stream || !/\bTJ\b/.test(stream)) continue;
    let font = new Map<string, string>();
    for (const op of stream.matchAll(/\/(F\d+) [\d.]+ Tf|\[([^\]]*)\]\s*TJ/g)) {
      if (op[1]) font = fonts.get(op[1]) ?? new Map();
      else lines.push([...op[2].matchAll(/<([0-9a-f]+)>/gi)].map((h) => h[1].match(/.{4}/g)!.map((g) => font.get(g.toLowerCase()) ?? '?').join('')).join(''));
    }
  }
  return lines.join('\n');
}
