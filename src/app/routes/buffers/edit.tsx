// Admins: add a lab buffer (/buffers/new) or edit one (/buffers/:bufferId/edit).
import { useNavigate, useParams } from 'react-router';
import { Notice, QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useBuffer } from '@/features/buffers/api/get-buffer';
import { LabBufferForm } from '@/features/buffers/components/lab-buffer-form';

export default function BufferEditRoute() {
  const { bufferId } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const buffer = useBuffer(bufferId);
  if (bufferId && buffer.isPending) return <Loading label="Loading the buffer system…" />;
  if (bufferId && buffer.isError) return <QueryError error={buffer.error} what="this buffer system" />;
  if (buffer.data?.builtIn) {
    return (
      <Notice tone="warning" title="Built-in systems are read-only">
        They come with their published sources. Add a lab buffer instead.
      </Notice>
    );
  }
  return (
    <>
      <PageHeader
        title={buffer.data ? `Edit ${buffer.data.name}` : 'Add a lab buffer'}
        description="Values at 25 °C and zero ionic strength, each with its source. The same rules the server applies check them before they are sent."
      />
      <LabBufferForm
        buffer={buffer.data}
        onSaved={(b) => {
          toast.show(bufferId ? 'Lab buffer saved.' : 'Lab buffer added to the library.');
          void navigate(paths.buffer.href(b.id));
        }}
        onCancel={() => void navigate(bufferId ? paths.buffer.href(bufferId) : paths.buffers.href())}
      />
    </>
  );
}
