/**
 * Uploaded images: the type from the file's first bytes (never its name or the browser's word),
 * then re-encoded with sharp so no metadata survives (EXIF, GPS, XMP, ICC comments), turned
 * upright by its orientation tag first, and a thumbnail made.
 */
import sharp, { type Metadata, type Sharp } from "sharp";
import { MAX_PHOTO_BYTES } from "./limits";

export { MAX_PHOTO_BYTES };
export const THUMB_SIZE_PX = 360;
export type PhotoType = "image/jpeg" | "image/png" | "image/webp";
const EXT: Record<PhotoType, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };
export const extensionOf = (t: PhotoType) => EXT[t];

/**
 * The image type from the magic bytes: JPEG FF D8 FF; PNG 89 50 4E 47 0D 0A 1A 0A (PNG spec
 * §5.2); WebP "RIFF" <size> "WEBP" (RIFF container, WebP container spec). Null for anything else.
 */
export function sniffImageType(bytes: Uint8Array): PhotoType | null {
  const b = bytes;
  if (b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return "image/jpeg";
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (b.length >= 8 && png.every((v, i) => b[i] === v)) return "image/png";
  const ascii = (from: number, to: number) => String.fromCharCode(...b.subarray(from, to));
  if (b.length >= 12 && ascii(0, 4) === "RIFF" && ascii(8, 12) === "WEBP") return "image/webp";
  return null;
}

/** A file name a person may see: no path parts, no control characters. Null when it tries a path. */
export function safeDisplayName(name: string): string | null {
  if (name.length > 200) return null;
  if (/[/\\\u0000-\u001f\u007f]/.test(name) || name.split(/[/\\]/).includes("..") || name === ".." || name.startsWith("..")) return null;
  return name.trim() || "photo";
}

export class ImageRejected extends Error {}

export interface ProcessedImage {
  type: PhotoType;
  full: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
}

/**
 * Checks and re-encodes an upload. Throws ImageRejected with a message for the person when the
 * bytes are not a JPEG/PNG/WebP sharp can read.
 */
export async function processImage(bytes: Buffer): Promise<ProcessedImage> {
  const type = sniffImageType(bytes);
  if (!type) throw new ImageRejected("That file is not a JPEG, PNG or WebP image (checked from its contents, not its name).");
  let img: Sharp;
  let meta: Metadata;
  try {
    img = sharp(bytes, { failOn: "error", limitInputPixels: 80_000_000 }).rotate();
    meta = await sharp(bytes).metadata();
  } catch {
    throw new ImageRejected("That image could not be read; it may be damaged. Try saving it again as JPEG, PNG or WebP.");
  }
  const fmt = meta.format;
  const matches =
    (type === "image/jpeg" && fmt === "jpeg") || (type === "image/png" && fmt === "png") || (type === "image/webp" && fmt === "webp");
  if (!matches) throw new ImageRejected("That file's contents do not match a JPEG, PNG or WebP image.");
  try {
    // sharp writes no metadata unless asked (withMetadata / keepExif): EXIF and GPS are dropped here.
    const encoded =
      type === "image/jpeg"
        ? img.jpeg({ quality: 88, mozjpeg: true })
        : type === "image/png"
          ? img.png({ compressionLevel: 8 })
          : img.webp({ quality: 88 });
    const { data: full, info } = await encoded.toBuffer({ resolveWithObject: true });
    const thumb = await sharp(full).resize(THUMB_SIZE_PX, THUMB_SIZE_PX, { fit: "cover" }).webp({ quality: 80 }).toBuffer();
    return { type, full, thumb, width: info.width, height: info.height };
  } catch {
    throw new ImageRejected("That image could not be read; it may be damaged. Try saving it again as JPEG, PNG or WebP.");
  }
}
