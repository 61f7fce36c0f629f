import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cookRunDetailSchema } from '../../../../shared/schemas/cook-runs';
import { upload } from '../../../lib/upload';
import { cookRunsQueries } from './cook-runs-queries';
import type { LogPlacement } from '../../../../shared/enums';

export function useUploadReadings(cookRunId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({
      file,
      placement,
      onProgress,
    }: {
      file: File;
      placement: LogPlacement;
      onProgress: (fraction: number) => void;
    }) => {
      const body = new FormData();
      body.append('placement', placement);
      body.append('file', file);
      return cookRunDetailSchema.parse(await upload(`/cook-runs/${cookRunId}/readings`, body, { onProgress }));
    },
    onSuccess: (run) => {
      queryClient.setQueryData(cookRunsQueries.detail(cookRunId).queryKey, run);
      return queryClient.invalidateQueries({ queryKey: cookRunsQueries.all });
    },
  });
}
