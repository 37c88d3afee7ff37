// The text a review step carries (a message, a comment or a reason), checked with the schema the
// server validates the step with, so a required comment is asked for before anything is sent.
import { useState, type FormEvent } from 'react';
import type { ZodType } from 'zod';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextAreaField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';

export type StepDialogProps = {
  title: string;
  /** What happens, and who is told. */
  description: string;
  label: string;
  hint: string;
  /** The server's schema of the step's body, and the field the text goes in. */
  schema: ZodType;
  field: 'message' | 'comment' | 'reason';
  confirmLabel: string;
  busy: boolean;
  error: string | null;
  onConfirm: (text: string) => void;
  onClose: () => void;
};

export function StepDialog(props: StepDialogProps) {
  const [text, setText] = useState('');
  const [fieldError, setFieldError] = useState<string | null>(null);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const checked = props.schema.safeParse({ [props.field]: text });
    if (!checked.success) return setFieldError(checked.error.issues[0]?.message ?? 'Check this field.');
    setFieldError(null);
    props.onConfirm(text);
  };
  return (
    <Dialog
      open
      onClose={props.onClose}
      title={props.title}
      footer={
        <>
          <Button onClick={props.onClose}>Cancel</Button>
          <Button type="submit" form="step-form" variant="primary" busy={props.busy}>
            {props.confirmLabel}
          </Button>
        </>
      }
    >
      <form id="step-form" onSubmit={submit} noValidate className="space-y-3">
        <p>{props.description}</p>
        <TextAreaField
          label={props.label}
          hint={props.hint}
          autoFocus
          rows={4}
          value={text}
          error={fieldError ?? undefined}
          onChange={(e) => setText(e.target.value)}
        />
        {props.error && <Notice tone="error">{props.error}</Notice>}
      </form>
    </Dialog>
  );
}
