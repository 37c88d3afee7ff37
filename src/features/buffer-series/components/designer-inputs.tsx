// The designer's input panel (react-hook-form context from SeriesDesigner).
import type { BufferSummary } from '@shared/schemas/buffers-types';
import { ConditionsFields } from './conditions-fields';
import { PHPointsFields } from './ph-points-fields';
import { SystemsFields } from './systems-fields';
import { WellFields } from './well-fields';

export type DesignerInputsProps = { library: BufferSummary[]; disabled?: boolean };

export function DesignerInputs({ library, disabled }: DesignerInputsProps) {
  return (
    <fieldset disabled={disabled} className="grid grid-cols-5 gap-3" aria-label="Series inputs">
      <PHPointsFields />
      <ConditionsFields />
      <SystemsFields library={library} />
      <WellFields library={library} />
    </fieldset>
  );
}
