import type { QueryClient } from '@tanstack/react-query';
import { meSchema } from '../../shared/schemas/auth';
import { jarStorySchema } from '../../shared/schemas/jar-story';
import { pageReadsId, type JarPageReadsDto } from '../../shared/schemas/page-reads';
import { authQueries } from '../features/auth/api/auth-queries';
import { jarsQueries } from '../features/jars/api/jars-queries';
import { settingsQueries } from '../features/settings/api/settings-queries';

/**
 * Puts the reads the server wrote into a jar page (server/core/page-preloads.ts) into the cache before
 * the first screen asks for them, parsed as the API's answers would be.
 */
export function seedPageReads(queryClient: QueryClient): void {
  const text = document.getElementById(pageReadsId)?.textContent;
  if (!text) return;
  try {
    const reads = JSON.parse(text) as JarPageReadsDto;
    queryClient.setQueryData(authQueries.me().queryKey, meSchema.parse(reads.me));
    queryClient.setQueryData(settingsQueries.detail().queryKey, reads.settings);
    if (reads.jar)
      queryClient.setQueryData(jarsQueries.byLabel(reads.jar.label).queryKey, jarStorySchema.parse(reads.jar.story));
  } catch {
    // Whatever was not seeded is asked of the API as on any other page.
  }
}
