/**
 * What a browser test reads off the 3D view's canvas: a copy of its pixels, sampled every second
 * pixel, told apart from the background paper (the top-left pixel), and a wait for the view to
 * finish drawing what the page just asked of it.
 */
import type { Page } from 'playwright-core';

export interface CanvasLook {
  /** Share of pixels that are not the background paper. */
  inked: number;
  /** Share of pixels in the selection's pencil red (red well above green and blue). */
  red: number;
  /** Box around the inked pixels, as shares of the canvas width and height. */
  inkBox: { x0: number; y0: number; x1: number; y1: number };
  /** A coarse 32 × 24 grey picture, to tell two views apart. */
  thumb: number[];
}

export async function lookAtCanvas(page: Page, canvas: string): Promise<CanvasLook> {
  return page.locator(canvas).evaluate((el) => {
    const source = el as HTMLCanvasElement;
    const copy = document.createElement('canvas');
    copy.width = source.width;
    copy.height = source.height;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(source, 0, 0);
    const { data, width, height } = ctx.getImageData(0, 0, copy.width, copy.height);
    const [r0, g0, b0] = [data[0]!, data[1]!, data[2]!];
    let inked = 0;
    let red = 0;
    let n = 0;
    let [x0, y0, x1, y1] = [width, height, 0, 0];
    const thumb = new Array<number>(32 * 24).fill(0);
    const counts = new Array<number>(32 * 24).fill(0);
    for (let y = 0; y < height; y += 2) {
      for (let x = 0; x < width; x += 2) {
        const i = (y * width + x) * 4;
        const [r, g, b] = [data[i]!, data[i + 1]!, data[i + 2]!];
        n++;
        const t = Math.floor((y / height) * 24) * 32 + Math.floor((x / width) * 32);
        thumb[t]! += (r + g + b) / 3;
        counts[t]!++;
        if (Math.abs(r - r0) + Math.abs(g - g0) + Math.abs(b - b0) > 30) {
          inked++;
          x0 = Math.min(x0, x);
          y0 = Math.min(y0, y);
          x1 = Math.max(x1, x);
          y1 = Math.max(y1, y);
        }
        if (r > g + 60 && r > b + 80) red++;
      }
    }
    return {
      inked: inked / n,
      red: red / n,
      inkBox: { x0: x0 / width, y0: y0 / height, x1: x1 / width, y1: y1 / height },
      thumb: thumb.map((s, k) => s / Math.max(1, counts[k]!)),
    };
  });
}

/** Lets the view draw what the page just asked of it (it renders on demand, in software here). */
export async function settleCanvas(page: Page): Promise<void> {
  const frames = () => page.evaluate(() => new Promise<void>((done) => requestAnimationFrame(() => requestAnimationFrame(() => setTimeout(done, 300)))));
  await frames();
  await page.locator('canvas[data-camera-settled="true"][data-solids-ready="true"]').waitFor({ timeout: 60_000 });
  await frames();
}
