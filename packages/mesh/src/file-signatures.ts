/**
 * Files people pick by mistake instead of the mould, told apart by their opening bytes (each
 * format's published signature), so the refusal can name what the file is.
 */
interface Signature {
  what: string;
  bytes: readonly number[];
  /** Where the signature starts (0 unless stated). */
  at?: number;
}

const ascii = (text: string): number[] => Array.from(text, (c) => c.charCodeAt(0));

const signatures: readonly Signature[] = [
  { what: 'a PNG image', bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  { what: 'a JPEG image', bytes: [0xff, 0xd8, 0xff] },
  { what: 'a GIF image', bytes: ascii('GIF8') },
  { what: 'a PDF document', bytes: ascii('%PDF-') },
  { what: 'a gzip archive', bytes: [0x1f, 0x8b] },
  { what: 'a 7-Zip archive', bytes: [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c] },
  { what: 'a RAR archive', bytes: ascii('Rar!\x1a\x07') },
  { what: 'a binary glTF model', bytes: ascii('glTF') },
  { what: 'an FBX model', bytes: ascii('Kaydara FBX Binary') },
  { what: 'a Blender file', bytes: ascii('BLENDER') },
  { what: 'a STEP file', bytes: ascii('ISO-10303-21') },
  { what: 'a PLY model', bytes: ascii('ply\n') },
  { what: 'a PLY model', bytes: ascii('ply\r\n') },
  { what: 'a Windows program', bytes: ascii('MZ') },
  { what: 'a WebP image', bytes: ascii('WEBP'), at: 8 },
];

/** What the file is when it is one of the known other formats, e.g. "a PDF document"; null otherwise. */
export function otherFormatOf(bytes: Uint8Array): string | null {
  for (const s of signatures) {
    const at = s.at ?? 0;
    if (bytes.length < at + s.bytes.length) continue;
    let same = true;
    for (let i = 0; i < s.bytes.length && same; i++) same = bytes[at + i] === s.bytes[i];
    if (same) return s.what;
  }
  return null;
}

/** A wrong-format sentence: what the file is, and what to send instead. */
export function notAMouldMessage(what: string): string {
  return `The file is ${what}, not a mould; export the mould from your CAD program as STL, 3MF or OBJ and upload that file.`;
}
