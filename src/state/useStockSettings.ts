/**
 * The stock the Materials page lays out on (sheet and board sizes, offcuts, kerf, trim, effort),
 * kept in this browser like the unit preference: it describes the maker's shop and saw, not a
 * design.
 */
import { create } from 'zustand';
import { createJSONStorage, persist } from 'zustand/middleware';
import { DEFAULT_STOCK_SETTINGS, type StockSettings } from '../../shared/materials/stockSettings.ts';

interface StockSettingsState {
  settings: StockSettings;
  setSettings: (settings: StockSettings) => void;
}

export const useStockSettings = create<StockSettingsState>()(
  persist(
    (set) => ({
      settings: DEFAULT_STOCK_SETTINGS,
      setSettings: (settings) => set({ settings }),
    }),
    {
      name: 'casewright.stock',
      version: 1,
      storage: createJSONStorage(() => localStorage),
      partialize: ({ settings }) => ({ settings }),
      // Fields missing from an older stored value take their defaults.
      merge: (stored, current) => ({ ...current, settings: { ...DEFAULT_STOCK_SETTINGS, ...((stored as Partial<StockSettingsState> | undefined)?.settings ?? {}) } }),
    },
  ),
);
