import { Notice } from '../../../components/ui/notice';
import { cautionFootnote } from '../../../config/cautions';

/** TRADE.md §5: alcohol and open flame at the inoculation bench. */
export function FlameCaution() {
  return (
    <Notice tone="warn" title="Alcohol and flame">
      <p>
        70 % isopropyl alcohol is flammable. Let a wipe-down dry fully before you flame a needle, and keep flame away
        from wet surfaces and open bottles. Follow your local fire code.
      </p>
      <p className="mt-2 text-sm text-muted">{cautionFootnote}</p>
    </Notice>
  );
}
