/**
 * The design editor's own state: the spec being edited with its undo history, what is selected
 * and hovered, and how the 3D view is set. Server data (the design, its revisions) stays in
 * TanStack Query; this store only remembers which revision the edit started from.
 */
import { create } from 'zustand';
import type { Climate } from '../../shared/wood/climate.ts';
import type { ParamValue, PieceSpec } from '../../shared/engine/types.ts';
import { record, redo, seal, startHistory, undo, type History } from '../editor/history.ts';

/** The preset camera positions of the 3D view. */
export type ViewName = 'front' | 'side' | 'top' | 'three-quarter';

/** A section plane across one world axis, at a position in mm. */
export interface Cutaway {
  axis: 'x' | 'y' | 'z';
  positionMm: number;
}

interface EditorState {
  designId: string | null;
  /** The revision number the edit started from; a save sends it as the base. */
  baseRevision: number | null;
  history: History<PieceSpec> | null;
  /** The spec as last loaded or saved: the edit is unsaved while the present differs from it. */
  savedSpec: PieceSpec | null;
  selectedPartId: string | null;
  hoveredPartId: string | null;
  explode: number;
  cutaway: Cutaway | null;
  view: ViewName;
  /** True when the 3D view shows the piece standing in its room (the spec's room section). */
  roomView: boolean;
  /** In the room view, what the camera frames: the opened piece and its surroundings, or the whole room. */
  roomFraming: 'piece' | 'room';
  /** Which form the parameter column shows: the piece's parameters or its room. */
  formTab: 'piece' | 'room';

  /** Starts editing `spec` of `designId` at `revision`, forgetting the previous history. */
  load: (designId: string, revision: number, spec: PieceSpec) => void;
  /** Marks `spec` as saved as `revision`, keeping the history. */
  markSaved: (revision: number, spec: PieceSpec) => void;
  /** Sets a parameter; `typing` merges successive keystrokes in one field into one undo step. */
  setParam: (key: string, value: ParamValue, typing?: boolean) => void;
  setClimate: (climate: Climate | undefined) => void;
  /**
   * Sets the room section (`undefined` removes it); `typing` names the room field being typed
   * in, so its keystrokes merge into one undo step as a parameter's do.
   */
  setRoom: (room: unknown, typing?: string | null) => void;
  /** Replaces the whole spec as one undo step (a proposal the maker applied, such as fit to niche). */
  replaceSpec: (spec: PieceSpec) => void;
  /** Ends the step for the field being typed in (on leaving it). */
  sealStep: () => void;
  undo: () => void;
  redo: () => void;
  select: (partId: string | null) => void;
  hover: (partId: string | null) => void;
  setExplode: (explode: number) => void;
  setCutaway: (cutaway: Cutaway | null) => void;
  setView: (view: ViewName) => void;
  setRoomView: (roomView: boolean) => void;
  setRoomFraming: (roomFraming: 'piece' | 'room') => void;
  setFormTab: (formTab: 'piece' | 'room') => void;
}

export const useEditorStore = create<EditorState>()((set) => ({
  designId: null,
  baseRevision: null,
  history: null,
  savedSpec: null,
  selectedPartId: null,
  hoveredPartId: null,
  explode: 0,
  cutaway: null,
  view: 'three-quarter',
  roomView: false,
  roomFraming: 'piece',
  formTab: 'piece',

  load: (designId, revision, spec) =>
    set({ designId, baseRevision: revision, history: startHistory(spec), savedSpec: spec, selectedPartId: null, hoveredPartId: null }),
  markSaved: (revision, spec) => set({ baseRevision: revision, savedSpec: spec }),
  setParam: (key, value, typing = false) =>
    set((state) => {
      if (!state.history || state.history.present.params[key] === value) return {};
      const present = state.history.present;
      return { history: record(state.history, { ...present, params: { ...present.params, [key]: value } }, typing ? key : null) };
    }),
  setClimate: (climate) =>
    set((state) => {
      if (!state.history) return {};
      const { climate: _old, ...rest } = state.history.present;
      return { history: record(state.history, climate ? { ...rest, climate } : rest, null) };
    }),
  setRoom: (room, typing = null) =>
    set((state) => {
      if (!state.history || state.history.present.room === room) return {};
      const { room: _old, ...rest } = state.history.present;
      return { history: record(state.history, room === undefined ? rest : { ...rest, room }, typing === null ? null : `room:${typing}`) };
    }),
  replaceSpec: (spec) => set((state) => (state.history && state.history.present !== spec ? { history: record(state.history, spec, null) } : {})),
  sealStep: () => set((state) => (state.history ? { history: seal(state.history) } : {})),
  undo: () => set((state) => (state.history ? { history: undo(state.history) } : {})),
  redo: () => set((state) => (state.history ? { history: redo(state.history) } : {})),
  select: (selectedPartId) => set({ selectedPartId }),
  hover: (hoveredPartId) => set({ hoveredPartId }),
  setExplode: (explode) => set({ explode: Math.min(1, Math.max(0, explode)) }),
  setCutaway: (cutaway) => set({ cutaway }),
  setView: (view) => set({ view }),
  setRoomView: (roomView) => set({ roomView }),
  setRoomFraming: (roomFraming) => set({ roomFraming }),
  setFormTab: (formTab) => set({ formTab }),
}));
