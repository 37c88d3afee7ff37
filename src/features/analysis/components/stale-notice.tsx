// Someone else saved the analysis settings since this page loaded (409 stale_version): offer to
// reload, so the change is made again on top of theirs rather than over it.
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';

export type StaleNoticeProps = { onReload: () => void; busy?: boolean };

export function StaleNotice({ onReload, busy }: StaleNoticeProps) {
  return (
    <Notice tone="warning" title="The settings changed elsewhere">
      <p>
        Someone saved the analysis settings after this page loaded. Reload the analysis, then make your change
        again.
      </p>
      <Button size="sm" className="mt-1" busy={busy} onClick={onReload}>
        Reload the analysis
      </Button>
    </Notice>
  );
}
