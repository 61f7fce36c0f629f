import { Notice } from '../../../components/ui/notice';
import { cautionFootnote } from '../../../config/cautions';

/** Shown wherever a jar is thrown out (TRADE.md §5: mould spores, disposal). */
export function DiscardCaution() {
  return (
    <Notice tone="warn" title="Mould spores and disposal">
      <p>
        Do not open a contaminated jar indoors. Sterilise it sealed before it is opened, emptied or washed. Sporulating
        moulds can cause allergy and lung irritation; Aspergillus is a risk to people with weak immunity — wear a fitted
        respirator (N95 / FFP2 or better) when you handle contaminated jars.
      </p>
      <p className="mt-1 text-sm text-muted">
        Follow your local waste and biosafety rules and occupational-health rules. {cautionFootnote}
      </p>
    </Notice>
  );
}
