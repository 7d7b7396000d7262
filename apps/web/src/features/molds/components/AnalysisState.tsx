import { Alert } from '../../../components/ui/Alert';
import { ButtonLink } from '../../../components/ui/ButtonLink';
import { Card } from '../../../components/ui/Card';
import { paths } from '../../../config/paths';
import type { MoldView } from '../types';
import { moldStatusWords } from '../utils/mold-status';
import { ProgressBar } from './ProgressBar';

/** A mould whose report is not there: still being measured, or refused with the reason. */
export function AnalysisState({ mold, mayUpload }: { mold: MoldView; mayUpload: boolean }) {
  if (mold.status === 'failed') {
    return (
      <Alert
        tone="error"
        title="The file could not be measured"
        live="none"
        actions={mayUpload ? <ButtonLink to={paths.newMould.getHref(mold.pieceId ? { pieceId: mold.pieceId } : {})}>Upload it again</ButtonLink> : null}
      >
        {mold.error?.message ?? 'The analysis stopped without saying why.'} Check the units and the up axis, or export the mould again as a closed solid.
      </Alert>
    );
  }
  return (
    <Card title="Measuring the cavity">
      <div className="flex flex-col gap-3">
        <p className="text-ink-soft">{moldStatusWords[mold.status].meaning} This page updates by itself.</p>
        <ProgressBar label="Analysis" share={mold.status === 'queued' ? 0 : mold.progress} />
      </div>
    </Card>
  );
}
