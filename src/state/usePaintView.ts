/** The paint colour the 3D view shows for painted pieces, kept in this browser (view state, never saved to a design). */
import { create } from 'zustand';
import { createJSONStorage, persist } from 'zustand/middleware';
import { DEFAULT_PAINT_ID } from '../editor/paintColours.ts';

interface PaintViewState {
  paintId: string;
  setPaint: (paintId: string) => void;
}

export const usePaintView = create<PaintViewState>()(
  persist((set) => ({ paintId: DEFAULT_PAINT_ID, setPaint: (paintId) => set({ paintId }) }), {
    name: 'casewright.paint-view',
    storage: createJSONStorage(() => localStorage),
  }),
);
