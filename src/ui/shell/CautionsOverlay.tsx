import { Cautions } from "../cautions/Cautions.tsx";

/** The cautions over the page: on first start, and whenever the designer asks. */
export function CautionsOverlay({ onClose }: { onClose: () => void }) {
  return (
    <div className="overlay" onKeyDown={(e) => e.key === "Escape" && onClose()}>
      <Cautions onClose={onClose} />
    </div>
  );
}
