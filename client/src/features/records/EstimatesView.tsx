import type { ReactNode } from 'react';
import type { FieldEstimates } from '../../../../shared/api/records';
import type { RecordKind } from '../../../../shared/records/columns';
import { PesticideCautions } from '../../shared/components/PesticideCautions';
import type { AdoptSlot } from './AdoptCell';
import { EfficacyEstimates } from './EfficacyEstimates';
import { GerminationEstimates } from './GerminationEstimates';
import { PlantEstimates } from './PlantEstimates';
import { SeedbankEstimates } from './SeedbankEstimates';

type Props = {
  estimates: FieldEstimates;
  /** Only these kinds (a preview shows the kind being uploaded). */
  kinds?: readonly RecordKind[];
  adopt?: AdoptSlot;
};

function Block({ title, lead, children }: { title: string; lead?: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-3 border-t border-silt-300 pt-5 first:border-t-0 first:pt-0">
      <h3 className="text-xl font-semibold">{title}</h3>
      {lead ? <p className="max-w-prose text-sm text-loam-700">{lead}</p> : null}
      {children}
    </section>
  );
}

/** The field's estimates by kind, each with its table, chart and (for editors) adopt actions. */
export function EstimatesView({ estimates, kinds, adopt }: Props) {
  const shows = (kind: RecordKind) => !kinds || kinds.includes(kind);
  const { germination, efficacy } = estimates;
  const nothing =
    estimates.seedbank.years.length === 0 &&
    estimates.plants.densities.length === 0 &&
    germination.length === 0 &&
    efficacy.length === 0;
  if (nothing) return <p className="text-loam-700">No estimates yet: upload records to see them here.</p>;
  return (
    <div className="flex flex-col gap-6">
      {shows('seedbank-samples') && estimates.seedbank.years.length > 0 ? (
        <Block
          title="Soil seedbank"
          lead="Seeds per area of ground in each layer: total count over the total core area, with an exact Poisson interval, or a negative-binomial one when the cores are over-dispersed (the index-of-dispersion test decides, as the table says)."
        >
          <SeedbankEstimates seedbank={estimates.seedbank} adopt={adopt} />
        </Block>
      ) : null}
      {shows('plant-counts') && estimates.plants.densities.length > 0 ? (
        <Block
          title="Plant counts"
          lead={`From ${estimates.plants.sources.map((s) => s.filename).join(', ')}.`}
        >
          <PlantEstimates plants={estimates.plants} adopt={adopt} />
        </Block>
      ) : null}
      {shows('germination-tests')
        ? germination.map((g) => (
            <Block key={g.upload.uploadId} title={`Germination test · ${g.upload.filename}`}>
              <GerminationEstimates test={g} adopt={adopt} />
            </Block>
          ))
        : null}
      {shows('efficacy-trials') && efficacy.length > 0 ? (
        <>
          {efficacy.map((e) => (
            <Block
              key={`${e.upload.uploadId}-${e.trial}`}
              title={`Efficacy trial ${e.trial} · ${e.upload.filename}`}
              lead="% control against the untreated check (Abbott 1925), per block against that block’s own check, so block-to-block weed pressure does not count as spread; the RCBD analysis of variance and Fisher’s LSD use the raw response."
            >
              <EfficacyEstimates trial={e} adopt={adopt} />
            </Block>
          ))}
          <PesticideCautions />
        </>
      ) : null}
    </div>
  );
}
