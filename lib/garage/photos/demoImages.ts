/**
 * Demo pictures drawn here with sharp from SVG: a plain side view of a vehicle and a close-up
 * sketch of a clearance point, each labelled "demo image". Nothing is taken from elsewhere.
 */
import sharp from "sharp";
import { escapeHtml as esc } from "@/lib/platform/text";

/** A side view: sky gradient, ground, a boxy body and two wheels; `lifted` raises the body. */
export async function demoVehiclePicture(label: string, opts: { body: string; cab: "pickup" | "wagon"; lifted: number }): Promise<Buffer> {
  const lift = opts.lifted;
  const bodyY = 220 - lift;
  const cab =
    opts.cab === "pickup"
      ? `<path d="M250 ${bodyY} L300 ${bodyY - 80} L420 ${bodyY - 80} L430 ${bodyY}" fill="${opts.body}"/><rect x="430" y="${bodyY - 10}" width="240" height="20" fill="${opts.body}"/>`
      : `<path d="M180 ${bodyY} L230 ${bodyY - 90} L600 ${bodyY - 90} L640 ${bodyY}" fill="${opts.body}"/>`;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="960" height="600">
  <defs><linearGradient id="sky" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#4b8fc2"/><stop offset="1" stop-color="#f5efe4"/></linearGradient></defs>
  <rect width="960" height="600" fill="url(#sky)"/>
  <rect y="430" width="960" height="170" fill="#d9c3a0"/>
  ${cab}
  <rect x="140" y="${bodyY}" width="560" height="110" rx="14" fill="${opts.body}"/>
  <rect x="270" y="${bodyY - 70}" width="60" height="55" fill="#b4d4ea" opacity="0.9"/>
  <g fill="#181b21"><circle cx="260" cy="380" r="${70 + lift / 6}"/><circle cx="600" cy="380" r="${70 + lift / 6}"/></g>
  <g fill="#a3acb8"><circle cx="260" cy="380" r="32"/><circle cx="600" cy="380" r="32"/></g>
  <text x="40" y="70" font-family="DejaVu Sans, sans-serif" font-size="38" fill="#0e1014">${esc(label)}</text>
  <text x="40" y="560" font-family="DejaVu Sans, sans-serif" font-size="24" fill="#353c46">demo image, drawn for Hubface</text>
</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer();
}

/** A close-up sketch: a tire shoulder, the part it nears and the measured gap. */
export async function demoPointPicture(label: string, gapText: string): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="800" height="600">
  <rect width="800" height="600" fill="#e6e8eb"/>
  <circle cx="260" cy="420" r="300" fill="#262b33"/>
  <circle cx="260" cy="420" r="250" fill="none" stroke="#434c58" stroke-width="18" stroke-dasharray="30 22"/>
  <rect x="600" y="60" width="120" height="520" fill="#76818f"/>
  <line x1="562" y1="300" x2="598" y2="300" stroke="#e25b16" stroke-width="6"/>
  <text x="430" y="270" font-family="DejaVu Sans, sans-serif" font-size="30" fill="#bd460f">${esc(gapText)}</text>
  <text x="30" y="60" font-family="DejaVu Sans, sans-serif" font-size="32" fill="#0e1014">${esc(label)}</text>
  <text x="30" y="580" font-family="DejaVu Sans, sans-serif" font-size="22" fill="#353c46">demo image, drawn for Hubface</text>
</svg>`;
  return sharp(Buffer.from(svg)).png().toBuffer();
}
