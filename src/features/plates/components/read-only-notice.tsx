import type { StudyStatus } from '@shared/schemas/studies';
import { Notice } from '@/components/ui/notice';

export type ReadOnlyNoticeProps = { status: StudyStatus; canWrite: boolean };

/** Why the map cannot be changed here. */
export function ReadOnlyNotice({ status, canWrite }: ReadOnlyNoticeProps) {
  if (!canWrite)
    return <Notice title="Read-only">Your role can look at plate maps but not change them.</Notice>;
  if (status === 'approved') {
    return (
      <Notice title="Read-only: the study is approved and locked">
        An admin can unlock it with a reason; then maps can change again.
      </Notice>
    );
  }
  return (
    <Notice title="Read-only: the study is in review">
      The map can change again once the lead returns the study.
    </Notice>
  );
}
