import { Notice } from '../../../components/ui/notice';
import { cautionFootnote } from '../../../config/cautions';

/** Shown wherever a contaminated jar is handled (DESIGN.md §7; TRADE.md §5). */
export function SporeCautions({ compact = false }: { compact?: boolean }) {
  return (
    <Notice tone="warn" title="Before you move this jar">
      <ul className="list-disc space-y-1 pl-5">
        <li>Keep it closed: never open a contaminated jar indoors.</li>
        <li>
          Sporulating moulds can cause allergy and lung inflammation; <i>Aspergillus</i> is a risk to anyone with weak
          immunity. Staff who are sensitive wear a fitted respirator (N95 / FFP2 or better).
        </li>
        <li>Sterilise the jar sealed in the pressure cooker before it is emptied, thrown out or washed.</li>
      </ul>
      {!compact && (
        <p className="mt-2 text-sm text-muted">
          Your local biosafety, waste and occupational-health rules come first. {cautionFootnote}
        </p>
      )}
    </Notice>
  );
}
