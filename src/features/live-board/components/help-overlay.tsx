import { Dialog } from "@/components/ui/dialog";
import { BOARD_SHORTCUTS } from "../hooks/board-keys";

/** The board's keys, opened with ? (keys typed into a field are left alone). */
export function HelpOverlay({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="Keys on the board" description="They work anywhere on the board except while typing in a field.">
      <dl className="grid grid-cols-[auto_1fr] items-baseline gap-x-6 gap-y-2 text-lg">
        {BOARD_SHORTCUTS.map((s) => (
          <div key={s.action} className="contents">
            <dt className="flex gap-1">
              {s.keys.map((k) => (
                <kbd key={k} className="rounded border-2 border-line-strong bg-sunken px-2 font-mono font-bold">
                  {k}
                </kbd>
              ))}
            </dt>
            <dd>{s.text}</dd>
          </div>
        ))}
      </dl>
    </Dialog>
  );
}
