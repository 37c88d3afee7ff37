// The review steps this user may take now, by role and status: submit (optional message), withdraw,
// approve (optional comment), return (comment required), unlock (admins, reason required).
import { useState } from 'react';
import { approveSchema, returnSchema, submitSchema, unlockSchema } from '@shared/schemas/review';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import type { ReviewStep } from '../api/review-step';
import { StepDialog, type StepDialogProps } from './step-dialog';

export type ReviewActionsProps = {
  steps: ReviewStep[];
  /** The user submitted the study themselves: someone else must approve it. */
  ownSubmission: boolean;
  busy: boolean;
  error: string | null;
  onStep: (step: ReviewStep, text: string, done: () => void) => void;
  onReset: () => void;
};

type TextStep = Exclude<ReviewStep, 'withdraw'>;

const dialogs: Record<
  TextStep,
  Omit<StepDialogProps, 'busy' | 'error' | 'onConfirm' | 'onClose'> & { button: string }
> = {
  submit: {
    button: 'Submit for review…',
    title: 'Submit for review',
    description:
      'The study locks while it is reviewed; the leads of its team get an e-mail with a link to it.',
    label: 'Message to the reviewers',
    hint: 'Optional.',
    schema: submitSchema,
    field: 'message',
    confirmLabel: 'Submit for review',
  },
  approve: {
    button: 'Approve…',
    title: 'Approve the study',
    description:
      'Approval locks the study: its numbers, curves and files stay as they are now. The author gets an e-mail.',
    label: 'Comment',
    hint: 'Optional.',
    schema: approveSchema,
    field: 'comment',
    confirmLabel: 'Approve and lock',
  },
  return: {
    button: 'Return with comments…',
    title: 'Return the study',
    description: 'The author gets the study back to change, with your comments by e-mail.',
    label: 'Comments for the author',
    hint: 'Required: say what should change.',
    schema: returnSchema,
    field: 'comment',
    confirmLabel: 'Return the study',
  },
  unlock: {
    button: 'Unlock…',
    title: 'Unlock the approved study',
    description:
      'The study becomes editable again (status “Returned”); the author is told by e-mail. The reason stays in the history and the audit log.',
    label: 'Reason',
    hint: 'Required.',
    schema: unlockSchema,
    field: 'reason',
    confirmLabel: 'Unlock the study',
  },
};

export function ReviewActions({ steps, ownSubmission, busy, error, onStep, onReset }: ReviewActionsProps) {
  const [open, setOpen] = useState<ReviewStep | null>(null);
  const close = () => {
    setOpen(null);
    onReset();
  };
  const order: ReviewStep[] = ['submit', 'approve', 'return', 'withdraw', 'unlock'];
  const shown = order.filter((s) => steps.includes(s) && !(s === 'approve' && ownSubmission));
  if (shown.length === 0 && !ownSubmission) return null;
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap gap-2">
        {shown.map((s) => (
          <Button
            key={s}
            variant={s === 'approve' || s === 'submit' ? 'primary' : 'secondary'}
            onClick={() => setOpen(s)}
          >
            {s === 'withdraw' ? 'Withdraw from review…' : dialogs[s].button}
          </Button>
        ))}
      </div>
      {ownSubmission && steps.includes('approve') && (
        <p className="text-sm text-ink-muted">
          You submitted this study, so another lead must approve it; you can still return it.
        </p>
      )}
      {open === 'withdraw' && (
        <ConfirmDialog
          open
          title="Withdraw from review"
          confirmLabel="Withdraw"
          busy={busy}
          error={error}
          onCancel={close}
          onConfirm={() => onStep('withdraw', '', close)}
        >
          <p>The study goes back to draft and can be changed again; submit it again when it is ready.</p>
        </ConfirmDialog>
      )}
      {open && open !== 'withdraw' && (
        <StepDialog
          {...dialogs[open]}
          busy={busy}
          error={error}
          onClose={close}
          onConfirm={(text) => onStep(open, text, close)}
        />
      )}
    </div>
  );
}
