// Copy a plate's map into a new plate, in this study or another editable study of the team.
import { useState } from 'react';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { studyStatusLabels } from '@shared/schemas/studies';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useCopyPlate } from '../api/copy-plate';
import { useCopyTargets } from '../api/get-copy-targets';

export type CopyPlateDialogProps = {
  plate: PlateSummary | null;
  studyId: string;
  onClose: () => void;
  onCopied: (copy: PlateSummary) => void;
};

export function CopyPlateDialog({ plate, studyId, onClose, onCopied }: CopyPlateDialogProps) {
  return plate ? <CopyForm plate={plate} studyId={studyId} onClose={onClose} onCopied={onCopied} /> : null;
}

function CopyForm({ plate, studyId, onClose, onCopied }: CopyPlateDialogProps & { plate: PlateSummary }) {
  const [name, setName] = useState(`${plate.name} (copy)`.slice(0, 80));
  const [target, setTarget] = useState(studyId);
  const targets = useCopyTargets(plate.teamId);
  const copy = useCopyPlate({ onSuccess: onCopied });
  const open = (targets.data ?? []).filter(
    (s) => s.status === 'draft' || s.status === 'returned' || s.id === studyId,
  );
  return (
    <Dialog
      open
      onClose={onClose}
      title={`Copy the map of ${plate.name}`}
      description="A new plate with the same format and map; reads are not copied."
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button
            variant="primary"
            busy={copy.isPending}
            disabled={!name.trim()}
            onClick={() =>
              copy.mutate({
                plateId: plate.id,
                name: name.trim(),
                studyId: target === studyId ? null : target,
              })
            }
          >
            Copy map
          </Button>
        </>
      }
    >
      <div className="space-y-4">
        {copy.error && <Notice tone="error">{copy.error.message}</Notice>}
        <TextField
          label="New plate name"
          value={name}
          maxLength={80}
          onChange={(e) => setName(e.target.value)}
          autoFocus
        />
        <SelectField
          label="Into study"
          value={target}
          onChange={(e) => setTarget(e.target.value)}
          hint="Studies in review or approved take no new plates."
        >
          {!targets.data && <option value={studyId}>This study</option>}
          {open.map((s) => (
            <option key={s.id} value={s.id}>
              {s.id === studyId ? `${s.name} (this study)` : `${s.name} · ${studyStatusLabels[s.status]}`}
            </option>
          ))}
        </SelectField>
      </div>
    </Dialog>
  );
}
