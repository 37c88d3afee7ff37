// Copy, cut and paste of wells: the browser's clipboard events while the grid has focus
// (Ctrl/⌘+C, X, V), and the toolbar's buttons (system clipboard where allowed, else this tab's).
import type { PlateFormat } from '@shared/plate/geometry';
import type { PlateMap } from '@shared/plate-map/schema';
import { useToast } from '@/components/ui/toast';
import {
  clipText,
  copyWells,
  parseClip,
  pasteClip,
  rememberClip,
  rememberedClip,
  type Clip,
} from '../utils/clipboard';
import { boundsOf, type Cell } from '../utils/grid';

type Options = {
  format: PlateFormat;
  map: PlateMap;
  names: string[];
  cursor: Cell;
  readOnly: boolean;
  edit: (map: PlateMap) => void;
  clear: () => void;
  select: (names: string[]) => void;
};

export function useMapClipboard({ format, map, names, cursor, readOnly, edit, clear, select }: Options) {
  const toast = useToast();
  const copy = (): Clip | null => {
    const clip = copyWells(map, names, format);
    if (clip) rememberClip(clip);
    return clip;
  };
  const paste = (clip: Clip | null) => {
    if (readOnly) return;
    if (!clip) return toast.show('Nothing to paste: copy wells of a Bellwether plate map first.', 'warning');
    const result = pasteClip(map, clip, boundsOf(names, format)?.top ?? cursor, format);
    edit(result.map);
    if (result.wells.length) select(result.wells);
    if (result.leftOut)
      toast.show(`${result.leftOut} copied well(s) fell off the plate and were left out.`, 'warning');
  };
  const onCopy = (e: ClipboardEvent) => {
    const clip = copy();
    if (!clip) return;
    e.clipboardData?.setData('text/plain', clipText(clip));
    e.preventDefault();
  };
  return {
    onCopy,
    onCut: (e: ClipboardEvent) => {
      onCopy(e);
      clear();
    },
    onPaste: (e: ClipboardEvent) => {
      e.preventDefault();
      paste(parseClip(e.clipboardData?.getData('text/plain') ?? '') ?? rememberedClip());
    },
    copyButton: () => {
      const clip = copy();
      if (clip) void navigator.clipboard?.writeText(clipText(clip)).catch(() => undefined);
      toast.show(`Copied ${names.length} well(s).`);
    },
    pasteButton: async () => {
      const text = await navigator.clipboard?.readText().catch(() => '');
      paste((text && parseClip(text)) || rememberedClip());
    },
  };
}
