import { useRef, useState } from "react";
import { importNewList } from "../../state/catalogController.ts";

const ACCEPT = ".csv,.tsv,.txt,.tab,text/csv,text/tab-separated-values,text/plain";

async function importFiles(files: FileList | File[]): Promise<void> {
  for (const file of Array.from(files)) importNewList({ name: file.name, bytes: await file.arrayBuffer() });
}

/** Three ways in: choose files, drop them (or dropped text), or paste a list. */
export function ImportPanel() {
  const [over, setOver] = useState(false);
  const [pasted, setPasted] = useState("");
  const [pasteName, setPasteName] = useState("");
  const [pasteCount, setPasteCount] = useState(1);
  const input = useRef<HTMLInputElement>(null);
  const importPasted = () => {
    if (pasted.trim() === "") return;
    importNewList({ name: pasteName.trim() === "" ? `Pasted list ${pasteCount}` : pasteName.trim(), text: pasted });
    setPasteCount(pasteCount + 1);
    setPasted("");
    setPasteName("");
  };
  return (
    <section className="card" aria-labelledby="import-title">
      <h2 id="import-title">Add a part list</h2>
      <div className="two-col">
        <div
          className={`dropzone${over ? " is-over" : ""}`}
          onDragOver={(e) => {
            e.preventDefault();
            setOver(true);
          }}
          onDragLeave={() => setOver(false)}
          onDrop={(e) => {
            e.preventDefault();
            setOver(false);
            if (e.dataTransfer.files.length > 0) void importFiles(e.dataTransfer.files);
            else {
              const text = e.dataTransfer.getData("text/plain");
              if (text.trim() !== "") importNewList({ name: `Dropped text ${pasteCount}`, text });
            }
          }}
        >
          <p>
            <strong>Drop CSV or TSV files here</strong>
          </p>
          <p className="muted">Any column names and units; semicolons with decimal commas too. Read in the background: the page stays usable.</p>
          <input
            ref={input}
            id="file-input"
            type="file"
            accept={ACCEPT}
            multiple
            className="visually-hidden"
            onChange={(e) => {
              if (e.target.files !== null) void importFiles(e.target.files);
              e.target.value = "";
            }}
          />
          <button type="button" className="primary" onClick={() => input.current?.click()}>
            Choose files…
          </button>
        </div>
        <div className="paste">
          <label htmlFor="paste-text">
            <strong>Or paste a list</strong> <span className="muted">(copied from a spreadsheet: tabs are fine)</span>
          </label>
          <textarea id="paste-text" rows={6} value={pasted} onChange={(e) => setPasted(e.target.value)} placeholder={"Part number\tInductance (uH)\tDCR (mOhm)\tIsat (A)\n…"} />
          <div className="button-row">
            <label htmlFor="paste-name">Name</label>
            <input id="paste-name" type="text" value={pasteName} placeholder={`Pasted list ${pasteCount}`} onChange={(e) => setPasteName(e.target.value)} />
            <button type="button" disabled={pasted.trim() === ""} onClick={importPasted}>
              Import pasted list
            </button>
          </div>
        </div>
      </div>
    </section>
  );
}
