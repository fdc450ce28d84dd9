import { Notice } from '@/components/ui/notice';
import { FRAME_STRUCTURE_NOTICE } from '@/lib/frames';

/** Always on a schedule: the tool counts and cuts timber; structure is for local rules or an engineer. */
export function StructureNotice() {
  return (
    <Notice tone="warning" data-testid="structure-notice">
      <strong>Not a structural design.</strong> {FRAME_STRUCTURE_NOTICE}
    </Notice>
  );
}
