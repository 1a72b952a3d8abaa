/**
 * Wood textures drawn in code on a canvas (no image files): light streaks for the grain, running
 * along the texture's u axis, which the part solids lay along each part's grain; and a fine even
 * speckle for sheet goods. Both are near-white and multiply the part's tone.
 */
import { CanvasTexture, RepeatWrapping, SRGBColorSpace } from 'three';

const WIDTH = 1024;
const HEIGHT = 256;

/** A small seeded generator (mulberry32) so every session draws the same wood. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function drawGrain(ctx: CanvasRenderingContext2D): void {
  const random = seeded(7);
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, WIDTH, HEIGHT);
  // Growth-ring streaks: gentle waves with a whole number of periods across the tile so the
  // texture repeats without a seam; each drawn again one tile up and down for the same reason.
  for (let i = 0; i < 90; i++) {
    const y0 = random() * HEIGHT;
    const amplitude = 1 + random() * 7;
    const waves = 1 + Math.floor(random() * 3);
    const phase = random() * Math.PI * 2;
    const dark = random() < 0.18;
    ctx.strokeStyle = `rgba(70, 40, 15, ${dark ? 0.2 + random() * 0.12 : 0.05 + random() * 0.1})`;
    ctx.lineWidth = dark ? 1.5 + random() * 2.5 : 0.6 + random() * 1.6;
    for (const shift of [-HEIGHT, 0, HEIGHT]) {
      ctx.beginPath();
      for (let x = 0; x <= WIDTH; x += 8) {
        const y = y0 + shift + amplitude * Math.sin((x / WIDTH) * waves * Math.PI * 2 + phase);
        if (x === 0) ctx.moveTo(x, y);
        else ctx.lineTo(x, y);
      }
      ctx.stroke();
    }
  }
  // Pores: short dashes along the grain.
  ctx.fillStyle = 'rgba(60, 35, 15, 0.16)';
  for (let i = 0; i < 1400; i++) ctx.fillRect(random() * WIDTH, random() * HEIGHT, 3 + random() * 9, 1);
}

function drawSheet(ctx: CanvasRenderingContext2D): void {
  const random = seeded(11);
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, WIDTH, HEIGHT);
  for (let i = 0; i < 5000; i++) {
    ctx.fillStyle = `rgba(70, 45, 20, ${0.03 + random() * 0.07})`;
    ctx.fillRect(random() * WIDTH, random() * HEIGHT, 1 + random() * 2, 1 + random() * 2);
  }
}

/** A repeating wood texture: `grain` for solid wood, `sheet` for plywood and MDF. */
export function createWoodTexture(kind: 'grain' | 'sheet'): CanvasTexture {
  const canvas = document.createElement('canvas');
  canvas.width = WIDTH;
  canvas.height = HEIGHT;
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('Assertion failed: a 2D canvas context is needed to draw the wood texture');
  if (kind === 'grain') drawGrain(ctx);
  else drawSheet(ctx);
  const texture = new CanvasTexture(canvas);
  texture.wrapS = RepeatWrapping;
  texture.wrapT = RepeatWrapping;
  texture.colorSpace = SRGBColorSpace;
  texture.anisotropy = 8;
  return texture;
}
