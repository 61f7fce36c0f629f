import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sendHistory } from './send-history';

export function useImportHistory() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: File; onProgress: (fraction: number) => void }) =>
      sendHistory(file, onProgress),
    // Imported jars, runs, sessions, cultures and incidents touch nearly every register and chart.
    onSuccess: (answer) => (answer.kind === 'imported' ? queryClient.invalidateQueries() : undefined),
  });
}
