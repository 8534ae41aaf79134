/**
 * Draws the app icons in public/ from the Hubface mark (components/ui/Logo.tsx): the favicon
 * (an ICO holding 16, 32 and 48 px PNGs), the web app manifest's icons and the Apple touch icon.
 * Run after changing the mark: `tsx scripts/make-icons.mts`. The outputs are committed.
 */
import { mkdir, writeFile } from "node:fs/promises";
import sharp from "sharp";

const studs = [0, 72, 144, 216, 288]
  .map((a) => {
    const r = (a - 90) * (Math.PI / 180);
    return `<circle cx="${(24 + 10 * Math.cos(r)).toFixed(3)}" cy="${(24 + 10 * Math.sin(r)).toFixed(3)}" r="2.1" fill="#fbf8f3"/>`;
  })
  .join("");
/** The mark; `pad` shrinks it inside a full square for maskable icons (the safe zone is the inner 80 %). */
const mark = (pad = 0, background = "none") =>
  `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${-pad} ${-pad} ${48 + 2 * pad} ${48 + 2 * pad}">` +
  (background === "none" ? "" : `<rect x="${-pad}" y="${-pad}" width="${48 + 2 * pad}" height="${48 + 2 * pad}" fill="${background}"/>`) +
  `<circle cx="24" cy="24" r="22" fill="#181b21"/><circle cx="24" cy="24" r="15.5" fill="none" stroke="#e25b16" stroke-width="3"/>` +
  `<circle cx="24" cy="24" r="5" fill="#fbf8f3"/>${studs}</svg>`;

const png = (svg: string, size: number) =>
  sharp(Buffer.from(svg), { density: 72 * Math.ceil(size / 48) * 2 })
    .resize(size, size)
    .png()
    .toBuffer();

/** An ICO file whose entries are PNG images (supported by every current browser). */
function ico(images: { size: number; data: Buffer }[]): Buffer {
  const header = Buffer.alloc(6);
  header.writeUInt16LE(0, 0);
  header.writeUInt16LE(1, 2);
  header.writeUInt16LE(images.length, 4);
  let offset = 6 + 16 * images.length;
  const entries = images.map(({ size, data }) => {
    const e = Buffer.alloc(16);
    e.writeUInt8(size >= 256 ? 0 : size, 0);
    e.writeUInt8(size >= 256 ? 0 : size, 1);
    e.writeUInt16LE(1, 4); // colour planes
    e.writeUInt16LE(32, 6); // bits per pixel
    e.writeUInt32LE(data.length, 8);
    e.writeUInt32LE(offset, 12);
    offset += data.length;
    return e;
  });
  return Buffer.concat([header, ...entries, ...images.map((i) => i.data)]);
}

await mkdir("public/icons", { recursive: true });
await writeFile("public/icon.svg", mark());
await writeFile("public/favicon.ico", ico(await Promise.all([16, 32, 48].map(async (size) => ({ size, data: await png(mark(), size) })))));
for (const size of [192, 512]) {
  await writeFile(`public/icons/icon-${size}.png`, await png(mark(), size));
  await writeFile(`public/icons/maskable-${size}.png`, await png(mark(8, "#181b21"), size));
}
await writeFile("public/icons/apple-touch-icon.png", await png(mark(4, "#fbf8f3"), 180));
console.log("icons written to public/");
