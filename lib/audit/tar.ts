// A minimal POSIX ustar writer for regular files whose size is known (the audit pack's files are written
// to disk first, so they are). Enough for `tar -xf` and every archive tool; no dependency needed.
import { createReadStream } from "node:fs";
import { stat } from "node:fs/promises";
import { Readable } from "node:stream";

const BLOCK = 512;

function octal(value: number, width: number): string {
  return value.toString(8).padStart(width - 1, "0") + "\0";
}

export function tarHeader(name: string, size: number, mtime: Date): Buffer {
  if (Buffer.byteLength(name) > 100) throw new Error(`tar entry name too long: ${name}`);
  const h = Buffer.alloc(BLOCK, 0);
  h.write(name, 0, "utf8");
  h.write(octal(0o644, 8), 100, "ascii");
  h.write(octal(0, 8), 108, "ascii");
  h.write(octal(0, 8), 116, "ascii");
  h.write(octal(size, 12), 124, "ascii");
  h.write(octal(Math.floor(mtime.getTime() / 1000), 12), 136, "ascii");
  h.write("        ", 148, "ascii"); // checksum is computed with its own field as spaces
  h.write("0", 156, "ascii");
  h.write("ustar\0", 257, "ascii");
  h.write("00", 263, "ascii");
  let sum = 0;
  for (const b of h) sum += b;
  h.write(octal(sum, 7) + " ", 148, "ascii");
  return h;
}

export interface TarEntry {
  name: string;
  path: string;
}

export async function* tarChunks(entries: TarEntry[], mtime: Date): AsyncGenerator<Buffer> {
  for (const e of entries) {
    const { size } = await stat(e.path);
    yield tarHeader(e.name, size, mtime);
    for await (const chunk of createReadStream(e.path)) yield chunk as Buffer;
    const pad = (BLOCK - (size % BLOCK)) % BLOCK;
    if (pad) yield Buffer.alloc(pad, 0);
  }
  yield Buffer.alloc(BLOCK * 2, 0);
}

export function tarStream(entries: TarEntry[], mtime: Date): Readable {
  return Readable.from(tarChunks(entries, mtime));
}
