import { IngestToken } from '@gelpoint/contracts';
import { useMutation } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';

export function issueIngestToken(): Promise<IngestToken> {
  return callRoute('issueIngestToken', {});
}

export function useIssueIngestToken() {
  return useMutation({ mutationFn: issueIngestToken });
}
