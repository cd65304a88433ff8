/**
 * Bytes to base64 text and back, for photos carried in a survey file. Works in browsers and in
 * Node (both have btoa/atob), in chunks so a large photo does not overflow the call stack.
 *
 * Example: bytesToBase64(new Uint8Array([255, 216, 255])) = '/9j/'.
 */
const CHUNK = 0x8000;

export function bytesToBase64(bytes: Uint8Array): string {
  let binary = '';
  for (let i = 0; i < bytes.length; i += CHUNK) {
    binary += String.fromCharCode(...bytes.subarray(i, i + CHUNK));
  }
  return btoa(binary);
}

export function base64ToBytes(text: string): Uint8Array<ArrayBuffer> {
  const binary = atob(text);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i += 1) bytes[i] = binary.charCodeAt(i);
  return bytes;
}
