// Everything an assay says, with units; the server's cautions for a pH series in amber, and what the
// measured rate reports given substrate relative to KM.
import type { ReactNode } from 'react';
import type { AssayDetail } from '@shared/schemas/records-types';
import { Notice } from '@/components/ui/notice';
import { formatGrouped, formatPlain } from '@/components/ui/numbers';
import {
  detectionLabels,
  extinctionUnitLabels,
  quantitationLabels,
  readModeLabels,
  regimeLabels,
  substrateWording,
} from '../utils/assay-words';

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-ink-muted">{label}</dt>
      <dd>{children}</dd>
    </>
  );
}

const unit = (value: string, u: string) => (
  <span className="tabular-nums">
    {value} <span className="text-ink-muted">{u}</span>
  </span>
);

export type AssayDetailsProps = { assay: AssayDetail };

export function AssayDetails({ assay: a }: AssayDetailsProps) {
  const wording = substrateWording(a);
  const cautions = [...a.cautions, ...(wording.caution ? [wording.caution] : [])];
  return (
    <div className="grid grid-cols-[1fr_24rem] items-start gap-6">
      <div className="space-y-5">
        <section aria-labelledby="assay-substrate">
          <h2 id="assay-substrate" className="mb-1 text-lg">
            Substrate
          </h2>
          <dl className="grid grid-cols-[12rem_1fr] gap-x-4 gap-y-1">
            <Row label="Substrate">{a.substrate}</Row>
            <Row label="Concentration [S]">{unit(formatPlain(a.substrateMm), 'mM')}</Row>
            <Row label="KM">{a.kmMm === null ? 'not given' : unit(formatPlain(a.kmMm), 'mM')}</Row>
            <Row label="Relative to KM">{regimeLabels[a.substrateRegime]}</Row>
          </dl>
          <p className="mt-2 max-w-3xl">{wording.text}</p>
        </section>
        <section aria-labelledby="assay-reading">
          <h2 id="assay-reading" className="mb-1 text-lg">
            Reading and quantitation
          </h2>
          <dl className="grid grid-cols-[12rem_1fr] gap-x-4 gap-y-1">
            <Row label="Read mode">{readModeLabels[a.readMode]}</Row>
            <Row label="Detection">{detectionLabels[a.detection]}</Row>
            <Row label={a.detection === 'fluorescence' ? 'Excitation' : 'Wavelength'}>
              {unit(String(a.wavelengthNm), 'nm')}
            </Row>
            {a.detection === 'fluorescence' && (
              <Row label="Emission">{a.emissionNm === null ? '—' : unit(String(a.emissionNm), 'nm')}</Row>
            )}
            <Row label="Quantified by">{quantitationLabels[a.quantitation]}</Row>
            {a.quantitation === 'extinction' && (
              <Row label="Extinction coefficient ε">
                {unit(formatGrouped(a.extinctionCoefficient), extinctionUnitLabels[a.extinctionUnit])}
              </Row>
            )}
            <Row label="Path length">
              {a.pathLengthCm === null ? 'from the well volume' : unit(formatPlain(a.pathLengthCm), 'cm')}
            </Row>
            <Row label="Well volume">{unit(formatPlain(a.wellVolumeUl), 'µL')}</Row>
            <Row label="Temperature">{unit(formatPlain(a.temperatureC), '°C')}</Row>
            {a.readMode === 'endpoint' && <Row label="Stop solution">{a.stopSolution || 'none'}</Row>}
            <Row label="Chromophore pKa">
              {a.chromophorePka === null ? 'not pH-dependent (none given)' : formatPlain(a.chromophorePka)}
            </Row>
          </dl>
        </section>
        {a.notes && (
          <section aria-labelledby="assay-notes">
            <h2 id="assay-notes" className="mb-1 text-lg">
              Notes
            </h2>
            <p className="max-w-3xl whitespace-pre-line">{a.notes}</p>
          </section>
        )}
      </div>
      <aside aria-label="For a pH series" className="space-y-3">
        {cautions.length > 0 ? (
          <Notice tone="warning" title="For a pH series">
            <ul className="list-disc space-y-1 pl-4">
              {cautions.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          </Notice>
        ) : (
          <Notice title="For a pH series">
            {a.chromophorePka !== null
              ? `The product’s absorbance depends on pH (chromophore pKa ${formatPlain(a.chromophorePka)}); the stop solution brings every well to the same form, so one standard serves all pH points.`
              : 'The read itself does not depend on pH.'}
          </Notice>
        )}
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <Row label="Team">{a.teamName}</Row>
          <Row label="Studies using it">{a.studyCount}</Row>
        </dl>
      </aside>
    </div>
  );
}
