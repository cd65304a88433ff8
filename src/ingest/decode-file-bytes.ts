/**
 * Text from the bytes of a logger file. A byte-order mark decides UTF-8 or UTF-16; without one
 * the bytes are read as UTF-8 when they are valid UTF-8, otherwise as Windows-1252 (the usual
 * single-byte encoding of older exports, where ° is one byte). Every other byte NUL is UTF-16
 * without a mark; any other NUL means the file is not text.
 *
 * Example: decodeFileBytes(Uint8Array.of(0x32, 0x31, 0xb0, 0x43)) = { ok: true, text: '21°C', encoding: 'windows-1252' }.
 */
import { ingestWarning, type IngestWarning } from './ingest-warnings.ts';

export type DecodedText = { ok: true; text: string; encoding: string } | { ok: false; error: IngestWarning };

export function decodeFileBytes(bytes: Uint8Array): DecodedText {
  if (bytes.length >= 2 && bytes[0] === 0xff && bytes[1] === 0xfe) return decoded(bytes.subarray(2), 'utf-16le');
  if (bytes.length >= 2 && bytes[0] === 0xfe && bytes[1] === 0xff) return decoded(bytes.subarray(2), 'utf-16be');
  if (bytes.length >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) return decoded(bytes.subarray(3), 'utf-8');
  const sample = bytes.subarray(0, 4096);
  let nul = 0;
  for (const b of sample) if (b === 0) nul++;
  if (nul > 0 && nul >= sample.length * 0.4) {
    // UTF-16 without a mark: every other byte NUL for ASCII text, all on the same side.
    let evenNul = 0;
    for (let i = 0; i < sample.length; i += 2) if (sample[i] === 0) evenNul++;
    if (evenNul >= 0.9 * nul) return decoded(bytes, 'utf-16be');
    if (evenNul <= 0.1 * nul) return decoded(bytes, 'utf-16le');
  }
  if (nul > 0) {
    return { ok: false, error: ingestWarning('not-text', 'The file holds binary data, not text: export the logger’s readings as a CSV or text file.') };
  }
  try {
    return { ok: true, text: new TextDecoder('utf-8', { fatal: true }).decode(bytes), encoding: 'utf-8' };
  } catch {
    return decoded(bytes, 'windows-1252');
  }
}

function decoded(bytes: Uint8Array, encoding: string): DecodedText {
  return { ok: true, text: new TextDecoder(encoding).decode(bytes), encoding };
}
