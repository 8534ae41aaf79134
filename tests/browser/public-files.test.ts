import { describe, expect, it } from "vitest";
import { BASE } from "./support/browser";

/** The files in public/ that browsers, home-screen installs and crawlers ask for. */
describe("public files", () => {
  it("serves the favicon, the web app manifest with its icons, and robots.txt", async () => {
    const ico = await fetch(`${BASE}/favicon.ico`);
    expect(ico.status).toBe(200);
    const bytes = Buffer.from(await ico.arrayBuffer());
    // ICO header: reserved 0, type 1 (icon), then the number of images (16, 32, 48 px).
    expect([bytes.readUInt16LE(0), bytes.readUInt16LE(2), bytes.readUInt16LE(4)]).toEqual([0, 1, 3]);

    const manifestRes = await fetch(`${BASE}/manifest.webmanifest`);
    expect(manifestRes.status).toBe(200);
    const manifest = (await manifestRes.json()) as {
      name: string;
      start_url: string;
      icons: { src: string; sizes: string; purpose?: string }[];
    };
    expect(manifest.name).toMatch(/Hubface/);
    expect(manifest.start_url).toBe("/");
    expect(manifest.icons.some((i) => i.sizes === "512x512" && i.purpose === "maskable")).toBe(true);
    for (const icon of manifest.icons) {
      const res = await fetch(`${BASE}${icon.src}`);
      expect(res.status, icon.src).toBe(200);
    }

    const robots = await fetch(`${BASE}/robots.txt`);
    expect(robots.status).toBe(200);
    const text = await robots.text();
    expect(text).toMatch(/^Disallow: \/api\/$/m);
    expect(text).toMatch(/^Disallow: \/shop$/m);
  });

  it("links the favicon and the manifest from every page's head", async () => {
    const html = await (await fetch(`${BASE}/convert`)).text();
    expect(html).toMatch(/<link rel="manifest" href="\/manifest.webmanifest"/);
    expect(html).toMatch(/<link rel="icon" href="\/favicon.ico"/);
    expect(html).toMatch(/<link rel="apple-touch-icon" href="\/icons\/apple-touch-icon.png"/);
  });
});
