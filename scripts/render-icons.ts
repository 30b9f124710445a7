/*
 * Renders the app's icon (app/icon.svg, our own drawing: a drop above the three layers of a clay liner) into
 * the files browsers ask for by name: app/favicon.ico (16, 32 and 48 px PNGs in one ICO) and app/apple-icon.png
 * (180 px, for a home screen). Run after changing the drawing: `npx tsx --conditions=react-server scripts/render-icons.ts`.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import puppeteer from "puppeteer";
import { CHROMIUM_CANDIDATES, CHROMIUM_FLAGS } from "../lib/server/pdf/chromium";

const ROOT = path.resolve(import.meta.dirname, "..");
const svg = readFileSync(path.join(ROOT, "app", "icon.svg"), "utf8");

/** An ICO file holding PNG images (allowed since Windows Vista; every current browser reads it). */
function ico(images: Array<{ size: number; png: Buffer }>): Buffer {
  const header = Buffer.alloc(6 + 16 * images.length);
  header.writeUInt16LE(0, 0);
  header.writeUInt16LE(1, 2); // 1 = icon
  header.writeUInt16LE(images.length, 4);
  let offset = header.length;
  images.forEach(({ size, png }, i) => {
    const at = 6 + 16 * i;
    header.writeUInt8(size >= 256 ? 0 : size, at);
    header.writeUInt8(size >= 256 ? 0 : size, at + 1);
    header.writeUInt8(0, at + 2); // no palette
    header.writeUInt8(0, at + 3);
    header.writeUInt16LE(1, at + 4); // colour planes
    header.writeUInt16LE(32, at + 6); // bits per pixel
    header.writeUInt32LE(png.length, at + 8);
    header.writeUInt32LE(offset, at + 12);
    offset += png.length;
  });
  return Buffer.concat([header, ...images.map((i) => i.png)]);
}

async function main() {
const browser = await puppeteer.launch({ executablePath: process.env.CHROME_PATH ?? CHROMIUM_CANDIDATES.find((p) => existsSync(p)), headless: true, args: CHROMIUM_FLAGS });
try {
  const page = await browser.newPage();
  const render = async (size: number): Promise<Buffer> => {
    await page.setViewport({ width: size, height: size, deviceScaleFactor: 1 });
    await page.setContent(`<html><body style="margin:0;background:transparent">${svg.replace("<svg ", `<svg width="${size}" height="${size}" `)}</body></html>`);
    return Buffer.from(await page.screenshot({ type: "png", omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } }));
  };
  const images: Array<{ size: number; png: Buffer }> = [];
  for (const size of [16, 32, 48]) images.push({ size, png: await render(size) }); // one page: one size at a time
  writeFileSync(path.join(ROOT, "app", "favicon.ico"), ico(images));
  writeFileSync(path.join(ROOT, "app", "apple-icon.png"), await render(180));
  console.log("wrote app/favicon.ico (16, 32, 48 px) and app/apple-icon.png (180 px)");
} finally {
  await browser.close();
}
}

void main();
