// Templates: save the current map under a name for the team; start this map from a template;
// delete a template the team no longer uses.
import { useState } from 'react';
import type { PlateMap } from '@shared/plate-map/schema';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextField } from '@/components/ui/field';
import { Notice, QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { formatDate } from '@/lib/format';
import { useCreateTemplate } from '../api/create-template';
import { useDeleteTemplate } from '../api/delete-template';
import { useTemplates } from '../api/get-templates';

type Common = { open: boolean; onClose: () => void; teamId: string; format: 96 | 384 };

export function SaveTemplateDialog({ open, onClose, teamId, format, map }: Common & { map: PlateMap }) {
  const toast = useToast();
  const [name, setName] = useState('');
  const create = useCreateTemplate({
    onSuccess: (t) => {
      toast.show(`Template “${t.name}” saved for the team.`);
      setName('');
      onClose();
    },
  });
  const wells = Object.keys(map.wells).length;
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Save as template"
      description={`The map as it is now (${wells} wells with a role) becomes a ${format}-well template for your team.`}
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button
            variant="primary"
            busy={create.isPending}
            disabled={!name.trim()}
            onClick={() => create.mutate({ teamId, name: name.trim(), format, map })}
          >
            Save template
          </Button>
        </>
      }
    >
      <div className="space-y-3">
        {create.error && <Notice tone="error">{create.error.message}</Notice>}
        <TextField
          label="Template name"
          value={name}
          maxLength={80}
          onChange={(e) => setName(e.target.value)}
          autoFocus
        />
      </div>
    </Dialog>
  );
}

export function ApplyTemplateDialog({
  open,
  onClose,
  teamId,
  format,
  onApply,
}: Common & { onApply: (map: PlateMap, name: string) => void }) {
  const toast = useToast();
  const templates = useTemplates(teamId, format, { enabled: open });
  const [chosen, setChosen] = useState<string | null>(null);
  const [confirming, setConfirming] = useState(false);
  const template = templates.data?.find((t) => t.id === chosen);
  const remove = useDeleteTemplate({
    onSuccess: (t) => {
      toast.show(`Template “${t.name}” deleted; plates made from it keep their maps.`);
      setChosen(null);
      setConfirming(false);
    },
  });
  const choose = (id: string) => {
    setChosen(id);
    setConfirming(false);
    remove.reset();
  };
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Apply a template"
      description="The template replaces the whole map. Undo (Ctrl+Z) brings the current map back."
      footer={
        <>
          <Button disabled={!template || confirming} onClick={() => setConfirming(true)}>
            Delete template…
          </Button>
          <Button onClick={onClose}>Cancel</Button>
          <Button
            variant="primary"
            disabled={!template}
            onClick={() => {
              if (!template) return;
              onApply(template.map, template.name);
              onClose();
            }}
          >
            Apply template
          </Button>
        </>
      }
    >
      {templates.isPending ? (
        <Loading label="Loading templates…" />
      ) : templates.isError ? (
        <QueryError error={templates.error} what="the templates" onRetry={() => void templates.refetch()} />
      ) : templates.data.length === 0 ? (
        <Notice>No {format}-well templates yet. Save a map as a template first.</Notice>
      ) : (
        <fieldset className="space-y-1">
          <legend className="sr-only">Templates</legend>
          {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
          {confirming && template && (
            <Notice tone="warning" title={`Delete “${template.name}” for the whole team?`}>
              <p>Plates already made from it keep their maps. This cannot be undone.</p>
              <div className="mt-2 flex gap-2">
                <Button size="sm" variant="primary" busy={remove.isPending} onClick={() => remove.mutate(template)}>
                  Delete “{template.name}”
                </Button>
                <Button size="sm" onClick={() => setConfirming(false)}>
                  Keep it
                </Button>
              </div>
            </Notice>
          )}
          {templates.data.map((t) => (
            <label key={t.id} className="flex items-baseline gap-2 rounded px-1 py-0.5 hover:bg-canvas">
              <input
                type="radio"
                name="template"
                checked={chosen === t.id}
                onChange={() => choose(t.id)}
              />
              <span className="font-semibold">{t.name}</span>
              <span className="text-sm text-ink-muted">
                {Object.keys(t.map.wells).length} wells · {formatDate(t.createdAt)}
              </span>
            </label>
          ))}
        </fieldset>
      )}
    </Dialog>
  );
}
