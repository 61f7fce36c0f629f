import { Notice } from '../../../components/ui/notice';
import { cautionFootnote } from '../../../config/cautions';

/** TRADE.md §5: the cautions that go with every screen about running a pressure vessel. */
export function PressureCaution() {
  return (
    <Notice tone="warn" title="Pressure vessels">
      <ul className="list-disc space-y-1 pl-5">
        <li>Check the gasket, vent and overpressure plug before each run, and let steam vent before you close it.</li>
        <li>
          Never open a cooker or autoclave while it is under pressure; let it depressurise by itself — never force-vent
          it.
        </li>
        <li>Never leave it unattended on heat, and have dial gauges checked every year.</li>
        <li>Stand clear of the lid when opening; wear heat-resistant gloves and eye protection.</li>
        <li>Follow the maker’s manual and your local pressure-equipment rules.</li>
      </ul>
      <p className="mt-2 text-sm text-muted">{cautionFootnote}</p>
    </Notice>
  );
}
