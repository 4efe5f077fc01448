import { Button } from '../../../../components/ui/button';
import { Notice } from '../../../../components/ui/notice';

/** Someone saved first: say so plainly, keep the typed input, and offer both ways forward. */
export function ConflictNotice({ message, onLoadLatest, onSaveOver }: { message: string; onLoadLatest: () => void; onSaveOver: () => void }) {
  return (
    <Notice tone="caution" className="mt-2" title="Someone else saved this scenario while you were editing">
      <p>{message} Your typed changes are still here and have not been saved.</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button size="sm" onClick={onLoadLatest}>Load their version (drops your changes)</Button>
        <Button size="sm" tone="primary" onClick={onSaveOver}>Save mine as the next revision</Button>
      </div>
    </Notice>
  );
}
