import { labelParamsSchema } from '../../shared/schemas/jar-labels';
import type { JarPageReadsDto } from '../../shared/schemas/page-reads';
import type { SessionUser } from '../core/auth-guards';
import { AppError } from '../core/errors';
import { readLabSettings } from '../settings/settings.service';
import { jarStory } from './jar-story.service';

/** The jar page's three reads, as the API would answer them; an unknown or malformed label leaves `jar` out. */
export async function jarPageReads(user: SessionUser, rawLabel: string): Promise<JarPageReadsDto> {
  const parsed = labelParamsSchema.safeParse({ label: rawLabel });
  const [settings, story] = await Promise.all([
    readLabSettings(),
    parsed.success
      ? jarStory({ label: parsed.data.label }).catch((error: unknown) => {
          if (error instanceof AppError && error.status === 404) return undefined;
          throw error;
        })
      : undefined,
  ]);
  const jar = parsed.success && story ? { label: parsed.data.label, story } : undefined;
  return { me: user, settings, ...(jar && { jar }) };
}
