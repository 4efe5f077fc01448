import { useCallback, useEffect, useRef, useState } from 'react';
import type { FieldValues, UseFormReturn } from 'react-hook-form';
import { UndoHistory } from './undo-history';

/** Undo and redo for every edit of a react-hook-form form, through immer patches. */
export interface UndoableForm {
  canUndo: boolean;
  canRedo: boolean;
  undo: () => void;
  redo: () => void;
  /** forget history and start from these values (after loading another revision) */
  restart: (values: FieldValues) => void;
}

export function useUndoableForm<T extends FieldValues>(form: UseFormReturn<T, unknown, unknown>): UndoableForm {
  const history = useRef<UndoHistory<T> | null>(null);
  history.current ??= new UndoHistory<T>(structuredClone(form.getValues()));
  const [flags, setFlags] = useState({ canUndo: false, canRedo: false });
  const sync = useCallback(() => {
    const h = history.current;
    if (h) setFlags((f) => (f.canUndo === h.canUndo && f.canRedo === h.canRedo ? f : { canUndo: h.canUndo, canRedo: h.canRedo }));
  }, []);

  useEffect(
    () =>
      form.subscribe({
        formState: { values: true },
        callback: ({ values }) => {
          if (history.current?.record(structuredClone(values) as T, Date.now())) sync();
        },
      }),
    [form, sync],
  );

  const apply = useCallback(
    (values: T | null | undefined) => {
      if (!values) return;
      form.reset(structuredClone(values), { keepDefaultValues: true });
      void form.trigger();
      sync();
    },
    [form, sync],
  );
  const undo = useCallback(() => apply(history.current?.undo()), [apply]);
  const redo = useCallback(() => apply(history.current?.redo()), [apply]);
  const restart = useCallback(
    (values: FieldValues) => {
      history.current?.reset(structuredClone(values) as T);
      form.reset(structuredClone(values) as T);
      sync();
    },
    [form, sync],
  );
  return { ...flags, undo, redo, restart };
}
