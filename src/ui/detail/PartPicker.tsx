import { useMemo, useState } from "react";
import { findPart, useCatalog } from "../../state/catalogStore.ts";
import { searchText } from "../../state/rankingView.ts";
import { openPart } from "../../state/workspaceActions.ts";

const SUGGESTIONS = 20;

/** Opens any loaded part by number, with suggestions as you type. */
export function PartPicker() {
  const merged = useCatalog((c) => c.merged);
  const [text, setText] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const suggestions = useMemo(() => {
    const q = text.trim().toLowerCase();
    if (q.length < 2) return [];
    const hay = searchText(merged.parts);
    const out: string[] = [];
    for (let i = 0; i < hay.length && out.length < SUGGESTIONS; i++) if (hay[i]!.includes(q)) out.push(merged.parts[i]!.partNumber);
    return out;
  }, [text, merged.parts]);
  const open = () => {
    const found = findPart(merged, text);
    if (found === null) setProblem(`No loaded part is numbered “${text.trim()}”.`);
    else {
      setProblem(null);
      setText("");
      openPart(found.part.partNumber);
    }
  };
  return (
    <form
      className="button-row"
      onSubmit={(e) => {
        e.preventDefault();
        open();
      }}
    >
      <label htmlFor="part-picker">Open part</label>
      <input id="part-picker" type="text" list="part-picker-list" value={text} onChange={(e) => setText(e.target.value)} placeholder="part number" aria-describedby="part-picker-problem" />
      <datalist id="part-picker-list">
        {suggestions.map((s) => (
          <option key={s} value={s} />
        ))}
      </datalist>
      <button type="submit">Open</button>
      <span id="part-picker-problem" className="field-error" role="status">
        {problem}
      </span>
    </form>
  );
}
