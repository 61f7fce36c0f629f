import type { IncidentPhotoDto } from '../../../../shared/schemas/incident-detail';
import { apiUrl } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';

export function IncidentPhotos({ photos }: { photos: IncidentPhotoDto[] }) {
  if (photos.length === 0) return <p className="text-muted">No photos.</p>;
  return (
    <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 print:grid-cols-3">
      {photos.map((p, i) => (
        <li key={p.id} className="print:break-inside-avoid">
          <a href={apiUrl(p.url.replace(/^\/api/, ''))} target="_blank" rel="noreferrer" className="block">
            <img
              src={apiUrl(p.thumbUrl.replace(/^\/api/, ''))}
              alt={p.caption ?? `As found, ${i + 1} of ${photos.length}`}
              width={p.width ?? undefined}
              height={p.height ?? undefined}
              loading="lazy"
              className="aspect-square w-full rounded-md border border-line object-cover print:aspect-auto print:object-contain"
            />
          </a>
          <span className="text-sm text-muted">
            {p.width && p.height ? `${p.width}×${p.height}` : ''} · added {formatDateTime(p.addedAt)}
          </span>
        </li>
      ))}
    </ul>
  );
}
