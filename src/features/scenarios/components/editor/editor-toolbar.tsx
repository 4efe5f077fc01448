import { useEffect } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../../components/ui/button';
import type { UndoableForm } from '../../hooks/use-undoable-form';

/** Undo, redo and save, with keyboard shortcuts (Ctrl/⌘+Z, Ctrl/⌘+Shift+Z or Ctrl+Y, Ctrl/⌘+S). */
export function EditorToolbar({ history, onSave, saving, dirty, revision, historyHref }: {
  history: UndoableForm;
  onSave: () => void;
  saving: boolean;
  dirty: boolean;
  revision: number;
  historyHref: string;
}) {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey)) return;
      const k = e.key.toLowerCase();
      if (k === 'z' && !e.shiftKey) {
        e.preventDefault();
        history.undo();
      } else if ((k === 'z' && e.shiftKey) || k === 'y') {
        e.preventDefault();
        history.redo();
      } else if (k === 's') {
        e.preventDefault();
        onSave();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [history, onSave]);
  return (
    <div role="toolbar" aria-label="Editing" className="flex flex-wrap items-center gap-2">
      <Button size="sm" onClick={history.undo} disabled={!history.canUndo} aria-keyshortcuts="Control+Z">Undo</Button>
      <Button size="sm" onClick={history.redo} disabled={!history.canRedo} aria-keyshortcuts="Control+Shift+Z">Redo</Button>
      <Button size="sm" tone="primary" onClick={onSave} busy={saving} disabled={!dirty} aria-keyshortcuts="Control+S">
        {dirty ? `Save as revision ${revision + 1}` : 'Saved'}
      </Button>
      <span className="text-sm text-ink-soft">{dirty ? 'Unsaved changes' : `Revision ${revision}`}</span>
      <Link className="text-sm text-spruce-700 underline" to={historyHref}>History</Link>
    </div>
  );
}
