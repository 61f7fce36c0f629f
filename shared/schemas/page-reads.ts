import type { MeDto } from './auth';
import type { JarStoryDto } from './jar-story';
import type { LabSettingsDto } from './settings';

/**
 * What the server writes into the page a jar's QR code opens, for a signed-in person: the answers of
 * GET /api/auth/me, /api/settings and /api/jars/by-label/:label, so the screen needs no round trip of
 * its own. `jar` is absent when no jar has that label; the page then asks the API and says so.
 */
export interface JarPageReadsDto {
  me: MeDto;
  settings: LabSettingsDto;
  jar?: { label: string; story: JarStoryDto };
}

/** The id of the <script type="application/json"> element that carries them. */
export const pageReadsId = 'page-reads';
