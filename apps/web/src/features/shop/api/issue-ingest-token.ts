import { IngestToken } from '@gelpoint/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function issueIngestToken(): Promise<IngestToken> {
  return api.post('/shop/ingest-token', {}, IngestToken);
}

export function useIssueIngestToken() {
  return useMutation({ mutationFn: issueIngestToken });
}
