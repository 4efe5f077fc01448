import { useBlocker } from 'react-router-dom';
import { Button } from '../../../../components/ui/button';
import { Notice } from '../../../../components/ui/notice';

/** Stops an in-app navigation away from unsaved changes and asks first. */
export function LeaveGuard({ dirty }: { dirty: boolean }) {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  if (blocker.state !== 'blocked') return null;
  return (
    <Notice tone="caution" className="mt-2" title="This scenario has unsaved changes">
      <div className="mt-1 flex flex-wrap gap-2">
        <Button size="sm" tone="primary" onClick={() => blocker.reset()}>Stay and keep editing</Button>
        <Button size="sm" tone="danger" onClick={() => blocker.proceed()}>Leave without saving</Button>
      </div>
    </Notice>
  );
}
