import { heicRefusal, photoMaxBytes } from '../../shared/schemas/photos';

const megabytes = photoMaxBytes / 1024 / 1024;

const startsWith = (b: Uint8Array, sig: number[], at = 0) => sig.every((v, i) => b[at + i] === v);
const ascii = (b: Uint8Array, from: number, to: number) => String.fromCharCode(...b.slice(from, to));

/**
 * The same check the server makes (type from the bytes, not the name), made on the phone so a
 * refused photo is caught before the flag is queued, with or without signal. Null when accepted.
 */
export async function photoRefusal(file: Blob & { name?: string }): Promise<string | null> {
  if (file.size > photoMaxBytes) return `Larger than ${megabytes} MB.`;
  const head = new Uint8Array(await file.slice(0, 16).arrayBuffer());
  if (startsWith(head, [0xff, 0xd8, 0xff])) return null;
  if (startsWith(head, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return null;
  if (ascii(head, 0, 4) === 'RIFF' && ascii(head, 8, 12) === 'WEBP') return null;
  if (ascii(head, 4, 8) === 'ftyp' && /^(heic|heix|hevc|mif1|msf1|heis)$/.test(ascii(head, 8, 12))) return heicRefusal;
  return `“${file.name ?? 'This file'}” is not a JPEG, PNG or WebP image.`;
}
