/** Byte-level tests shared by the readers: is this text, and how does it open. */

function isTextByte(b: number): boolean {
  // Tab, line breaks and printable ASCII; bytes from 128 up may be UTF-8 (names, comments).
  return (b >= 9 && b <= 13) || (b >= 32 && b <= 126) || b >= 128;
}

function isSpace(b: number | undefined): boolean {
  return b === 32 || (b !== undefined && b >= 9 && b <= 13);
}

/** No control bytes other than tabs and line breaks: text, not binary data. */
export function looksLikeText(bytes: Uint8Array): boolean {
  for (let i = 0; i < bytes.length; i++) if (!isTextByte(bytes[i]!)) return false;
  return true;
}

export function onlyWhitespace(bytes: Uint8Array): boolean {
  for (let i = 0; i < bytes.length; i++) if (!isSpace(bytes[i])) return false;
  return true;
}

export function withoutByteOrderMark(bytes: Uint8Array): Uint8Array {
  return bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? bytes.subarray(3) : bytes;
}

/** True when the bytes open with the word (after an optional UTF-8 byte-order mark and spaces), in any case. */
export function opensWith(bytes: Uint8Array, word: string): boolean {
  let i = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
  while (i < bytes.length && isSpace(bytes[i])) i++;
  for (let k = 0; k < word.length; k++) if ((bytes[i + k]! | 0x20) !== word.charCodeAt(k)) return false;
  const after = bytes[i + word.length];
  return after === undefined || isSpace(after);
}
