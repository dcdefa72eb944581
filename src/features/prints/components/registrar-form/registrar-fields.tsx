import type { AssetRecord } from '@shared/types/asset';
import { AcquisitionFields } from './acquisition-fields';
import { MarksFields } from './marks-fields';
import { ProvenanceFields } from './provenance-fields';
import { RightsFields } from './rights-fields';
import type { RegistrarFormParts } from './types';

/** The registrar's part of the print form (archivists and admins). */
export function RegistrarFields({
  photographs,
  ...parts
}: RegistrarFormParts & { photographs: AssetRecord[] }) {
  return (
    <>
      <AcquisitionFields {...parts} />
      <ProvenanceFields {...parts} />
      <RightsFields {...parts} />
      <MarksFields {...parts} photographs={photographs} />
    </>
  );
}
