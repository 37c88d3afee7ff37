// One ionization step of a buffer system: every value with its unit and its source.
import type { ReactNode } from 'react';
import type { BufferForm, Ionization } from '@shared/chemistry';
import type { BufferStepSummary } from '@shared/schemas/buffers-types';
import { formatFixed, formatPlain } from '@/components/ui/numbers';
import { SourceNote } from './source-note';

export type IonizationCardProps = { ion: Ionization; summary?: BufferStepSummary; forms: BufferForm[] };

type RowProps = { label: string; value: ReactNode; source?: ReactNode; text?: boolean };

function Row({ label, value, source, text }: RowProps) {
  return (
    <tr className="border-b border-line last:border-b-0">
      <th scope="row" className="w-48 px-3 py-1 text-left font-normal text-ink-muted">
        {label}
      </th>
      <td className={`px-3 py-1 ${text ? '' : 'num'}`}>{value}</td>
      <td className="px-3 py-1">{source}</td>
    </tr>
  );
}

const charge = (z: number) => (z > 0 ? `+${z}` : z < 0 ? `−${-z}` : '0');

function royEquation(roy: NonNullable<Ionization['roy']>): string {
  const { A, B, C, validFromC, validToC } = roy;
  const sign = (x: number) => (x < 0 ? '−' : '+');
  return `pK = ${formatPlain(A)}/T ${sign(B)} ${Math.abs(B)} ${sign(C)} ${Math.abs(C)}·ln T (${validFromC}–${validToC} °C)`;
}

function temperatureModel(ion: Ionization): string {
  if (ion.temperatureModel === 'roy') return 'Roy equation (below)';
  if (ion.temperatureModel === 'slope') return 'Linear in T with dpKa/dT';
  return ion.dH === null ? 'Goldberg eq. 4 from dpKa/dT' : 'Goldberg eq. 4 with ΔH and ΔCp (SCIENCE.md §2.1)';
}

export function IonizationCard({ ion, summary, forms }: IonizationCardProps) {
  const formName = (id: string) => forms.find((f) => f.id === id)?.name ?? id;
  return (
    <section aria-label={`Ionization ${ion.label}`} className="rounded border border-line bg-surface">
      <h3 className="border-b border-line px-3 py-1.5 text-base">
        {ion.label} <span className="font-normal text-ink-muted">· row source</span>{' '}
        <SourceNote source={ion.sources.row} />
      </h3>
      <table className="w-full border-collapse">
        <thead className="sr-only">
          <tr>
            <th scope="col">Quantity</th>
            <th scope="col">Value</th>
            <th scope="col">Source</th>
          </tr>
        </thead>
        <tbody>
          <Row
            label="pKa at 25 °C, I = 0"
            value={formatPlain(ion.pKa25)}
            source={<SourceNote source={ion.sources.pKa25} />}
          />
          <Row
            label="pKa at 37 °C, I = 0"
            value={formatFixed(summary?.pKa37, 3)}
            source={<SourceNote source="derived (SCIENCE.md §2.1)" />}
          />
          <Row label="Charge of the acid form" value={charge(ion.zAcid)} />
          <Row
            label="ΔH (kJ/mol)"
            value={formatPlain(ion.dH)}
            source={ion.dH === null ? null : <SourceNote source={ion.sources.dH} />}
          />
          <Row
            label="ΔCp (J K⁻¹ mol⁻¹)"
            value={formatPlain(ion.dCp)}
            source={ion.dCp === null ? null : <SourceNote source={ion.sources.dCp} />}
          />
          <Row
            label="dpKa/dT (K⁻¹)"
            value={ion.dpKadT !== null && ion.dpKadT > 0 ? `+${ion.dpKadT}` : formatPlain(ion.dpKadT)}
            source={ion.dpKadT === null ? null : <SourceNote source={ion.sources.dpKadT} />}
          />
          <Row label="Temperature model" text value={temperatureModel(ion)} />
          {ion.roy && (
            <Row
              label={ion.temperatureModel === 'roy' ? 'Roy equation (used)' : 'Roy equation (not used)'}
              text
              value={royEquation(ion.roy)}
              source={<SourceNote source={ion.roy.source} />}
            />
          )}
          <Row
            label="Useful range (pH)"
            value={`${formatFixed(ion.usefulRange[0], 2)} – ${formatFixed(ion.usefulRange[1], 2)}`}
            source={<SourceNote source={ion.sources.usefulRange} />}
          />
          {ion.publishedPoints.map((p) => (
            <Row
              key={`${p.celsius}-${p.source}`}
              label={`Published pKa at ${p.celsius} °C`}
              value={`${formatPlain(p.pKa)}${p.uncertainty ? ` ± ${p.uncertainty}` : ''}`}
              source={<SourceNote source={p.source} />}
            />
          ))}
          <Row
            label="Recipe by mixing"
            text
            value={ion.mixFormIds ? `${formName(ion.mixFormIds[0])} + ${formName(ion.mixFormIds[1])}` : '—'}
          />
          <Row
            label="Recipe by titration"
            text
            value={
              ion.titration ? `${formName(ion.titration.startFormId)} with ${ion.titration.titrant}` : '—'
            }
          />
        </tbody>
      </table>
      {ion.note && <p className="border-t border-line px-3 py-1.5 text-sm text-ink-muted">{ion.note}</p>}
    </section>
  );
}
