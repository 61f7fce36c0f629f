import { SporeCautions } from './spore-cautions';

/** The spore cautions in one line on the phone, the whole of them a tap away (DESIGN.md §7). */
export function CompactCautions() {
  return (
    <details className="rounded-md border-l-4 border-warn bg-warn-soft">
      <summary className="flex min-h-touch cursor-pointer items-center px-3 text-sm font-medium">
        Keep it closed; never open it indoors. Sterilise before disposal. More…
      </summary>
      <div className="p-2 pt-0">
        <SporeCautions />
      </div>
    </details>
  );
}
