import { useCallback, useState } from 'react';
import type { OnChangeFn, VisibilityState } from '@tanstack/react-table';

/** A stored choice read back defensively: anything but `{column: boolean}` counts as no choice. */
export function readVisibility(text: string | null, defaults: VisibilityState = {}): VisibilityState {
  if (!text) return { ...defaults };
  try {
    const parsed: unknown = JSON.parse(text);
    if (!parsed || typeof parsed !== 'object' || Array.isArray(parsed)) return { ...defaults };
    const stored = Object.fromEntries(Object.entries(parsed).filter(([, v]) => typeof v === 'boolean')) as VisibilityState;
    return { ...defaults, ...stored };
  } catch {
    return { ...defaults };
  }
}

function storage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    // Storage can be switched off; the table then forgets the choice on reload.
    return null;
  }
}

/**
 * Which columns a table shows, remembered in this browser (localStorage) under `key`:
 * a personal habit, not a view to share, so it stays out of the address.
 */
export function useStoredColumnVisibility(
  key: string,
  defaults: VisibilityState = {},
): [VisibilityState, OnChangeFn<VisibilityState>] {
  const [visibility, setVisibility] = useState<VisibilityState>(() => readVisibility(storage()?.getItem(key) ?? null, defaults));

  const onChange = useCallback<OnChangeFn<VisibilityState>>(
    (updater) => {
      setVisibility((current) => {
        const next = typeof updater === 'function' ? updater(current) : updater;
        try {
          storage()?.setItem(key, JSON.stringify(next));
        } catch {
          // A full or blocked storage only costs the memory of the choice.
        }
        return next;
      });
    },
    [key],
  );

  return [visibility, onChange];
}
