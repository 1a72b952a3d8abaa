/**
 * The 3D view's materials, made once and shared: one wood material per tone, texture, highlight
 * and clipping state, one section-cap material per tone, and the outline materials. Changing the
 * selection swaps which shared material a mesh uses; nothing is rebuilt.
 */
import {
  AlwaysStencilFunc, BackSide, Color, DecrementWrapStencilOp, DoubleSide, FrontSide, IncrementWrapStencilOp, LineBasicMaterial,
  MeshBasicMaterial, MeshStandardMaterial, NotEqualStencilFunc, ZeroStencilOp, type Material, type Plane, type Texture,
} from 'three';
import { createWoodTexture } from './grainTexture.ts';
import { SECTION_HATCHES } from './sectionHatch.ts';

/** The product's one accent: selected parts and collisions. */
export const PENCIL_RED = '#b8412e';
/** Graphite ink for outlines. */
export const GRAPHITE = '#2f3437';
/** Section faces are the wood's tone this much darker, as fresh-cut end grain reads. */
const SECTION_SHADE = 0.8;
/** Hatch lines are the section tone this much darker, and this wide (px). */
const HATCH_SHADE = 0.5;
const HATCH_LINE_PX = 1.4;

/**
 * The section face of one part, drawn on a quad lying in the section plane where the part's
 * stencil count says the plane is inside the part (see `stencilCounter`); the draw also clears
 * the count for the next part. Flat, with a hatch drawn in screen space (gl_FragCoord) as a
 * drafter hatches a section: the lines keep their spacing however the cut face is turned.
 */
function hatchedSection(toneHex: string, hatch: number): MeshBasicMaterial {
  const h = SECTION_HATCHES[hatch % SECTION_HATCHES.length]!;
  const m = new MeshBasicMaterial({
    color: new Color(toneHex).multiplyScalar(SECTION_SHADE),
    side: DoubleSide,
    stencilWrite: true,
    stencilRef: 0,
    stencilFunc: NotEqualStencilFunc,
    stencilFail: ZeroStencilOp,
    stencilZFail: ZeroStencilOp,
    stencilZPass: ZeroStencilOp,
  });
  const a = (h.angleDeg * Math.PI) / 180;
  const glsl = (x: number): string => x.toFixed(6);
  const across = `vec2(${glsl(-Math.sin(a))}, ${glsl(Math.cos(a))})`;
  const along = `vec2(${glsl(Math.cos(a))}, ${glsl(Math.sin(a))})`;
  const line = (dir: string): string => `step(fract(dot(gl_FragCoord.xy, ${dir}) / ${glsl(h.spacingPx)}), ${glsl(HATCH_LINE_PX / h.spacingPx)})`;
  m.onBeforeCompile = (shader) => {
    shader.fragmentShader = shader.fragmentShader.replace(
      '#include <color_fragment>',
      `#include <color_fragment>
      float hatchLine = ${h.cross ? `max(${line(across)}, ${line(along)})` : line(across)};
      diffuseColor.rgb = mix(diffuseColor.rgb, diffuseColor.rgb * ${glsl(HATCH_SHADE)}, hatchLine);`,
    );
  };
  m.customProgramCacheKey = () => `section-hatch-${hatch % SECTION_HATCHES.length}`;
  return m;
}

export type Highlight = 'none' | 'hover' | 'selected';

export interface WoodMaterialKey {
  toneHex: string;
  texture: 'grain' | 'sheet';
  highlight: Highlight;
}

/** Shared materials for one view; `dispose` frees them and their textures. */
export interface WoodMaterials {
  wood(key: WoodMaterialKey): MeshStandardMaterial;
  /** The cut faces of a part of this tone, in hatch `hatch` (see sectionHatch.ts). */
  sectionCap(toneHex: string, hatch: number): MeshBasicMaterial;
  /** Counts, per pixel, how often the clipped solid's back and front faces lie behind the plane. */
  stencilCounter(side: 'back' | 'front'): MeshBasicMaterial;
  outline(highlight: Highlight): LineBasicMaterial;
  /** Clips every material by `plane`, or stops clipping when null. */
  setClipping(plane: Plane | null): void;
  dispose(): void;
}

/** A new material set for one PieceView. */
export function createWoodMaterials(): WoodMaterials {
  const textures = new Map<'grain' | 'sheet', Texture>();
  const woods = new Map<string, MeshStandardMaterial>();
  const caps = new Map<string, MeshBasicMaterial>();
  const outlines = new Map<Highlight, LineBasicMaterial>();
  const counters = new Map<'back' | 'front', MeshBasicMaterial>();
  let clipping: Plane[] | null = null;

  const textureFor = (kind: 'grain' | 'sheet'): Texture => {
    let t = textures.get(kind);
    if (!t) {
      t = createWoodTexture(kind);
      textures.set(kind, t);
    }
    return t;
  };
  // Everything but the caps is clipped; the caps lie in the plane itself.
  const clipped = (): Material[] => [...woods.values(), ...outlines.values(), ...counters.values()];
  const clip = (m: Material): void => {
    m.clippingPlanes = clipping;
    m.needsUpdate = true;
  };

  return {
    wood({ toneHex, texture, highlight }) {
      const key = `${toneHex}|${texture}|${highlight}`;
      let m = woods.get(key);
      if (!m) {
        m = new MeshStandardMaterial({
          color: new Color(toneHex),
          map: textureFor(texture),
          roughness: 0.78,
          metalness: 0,
          emissive: new Color(PENCIL_RED),
          emissiveIntensity: highlight === 'selected' ? 0.55 : highlight === 'hover' ? 0.22 : 0,
          // Faces meeting in a joint are coplanar; keep the one in front from flickering.
          polygonOffset: true,
          polygonOffsetFactor: 1,
          polygonOffsetUnits: 1,
        });
        clip(m);
        woods.set(key, m);
      }
      return m;
    },
    sectionCap(toneHex, hatch) {
      const key = `${toneHex}|${hatch}`;
      let m = caps.get(key);
      if (!m) {
        m = hatchedSection(toneHex, hatch);
        caps.set(key, m);
      }
      return m;
    },
    outline(highlight) {
      let m = outlines.get(highlight);
      if (!m) {
        m = highlight === 'selected'
          ? new LineBasicMaterial({ color: PENCIL_RED })
          : new LineBasicMaterial({ color: GRAPHITE, transparent: true, opacity: highlight === 'hover' ? 0.7 : 0.32 });
        clip(m);
        outlines.set(highlight, m);
      }
      return m;
    },
    stencilCounter(side) {
      let m = counters.get(side);
      if (!m) {
        // A closed solid cut by the plane: behind a pixel where the plane is inside the solid
        // there is one more back face than front faces. Depth is ignored; nothing is drawn.
        const op = side === 'back' ? IncrementWrapStencilOp : DecrementWrapStencilOp;
        m = new MeshBasicMaterial({
          side: side === 'back' ? BackSide : FrontSide,
          colorWrite: false,
          depthWrite: false,
          depthTest: false,
          stencilWrite: true,
          stencilFunc: AlwaysStencilFunc,
          stencilFail: op,
          stencilZFail: op,
          stencilZPass: op,
        });
        clip(m);
        counters.set(side, m);
      }
      return m;
    },
    setClipping(plane) {
      clipping = plane ? [plane] : null;
      for (const m of clipped()) clip(m);
    },
    dispose() {
      for (const m of [...clipped(), ...caps.values()]) m.dispose();
      counters.clear();
      for (const t of textures.values()) t.dispose();
      woods.clear();
      caps.clear();
      outlines.clear();
      textures.clear();
    },
  };
}
