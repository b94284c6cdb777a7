import { useRef, useState } from "react";
import { openProject, saveProject } from "../../state/projectFile.ts";
import { workspaceStore } from "../../state/workspaceStore.ts";
import { replaceWorkspace } from "../../state/workspaceActions.ts";
import { notify } from "../../state/noticeStore.ts";
import { downloadText } from "../common/download.ts";

function fileName(name: string): string {
  const slug = name.normalize("NFKD").replace(/[^\w]+/g, "-").replace(/^-|-$/g, "").toLowerCase().slice(0, 60);
  return `coilsift-project${slug === "" ? "" : `-${slug}`}.json`;
}

/** The whole workspace to a file and back (spec, lists as read, column choices, shortlist, view). */
export function ProjectFileControls() {
  const input = useRef<HTMLInputElement>(null);
  const [message, setMessage] = useState<string | null>(null);
  const save = () => {
    const w = workspaceStore.getState();
    try {
      downloadText(fileName(w.name), saveProject(w), "application/json");
      setMessage(null);
    } catch (error) {
      setMessage(`The project could not be saved: ${error instanceof Error ? error.message : String(error)}`);
    }
  };
  const open = async (file: File) => {
    const opened = openProject(await file.text());
    if (!opened.ok) {
      setMessage(`${file.name} was not opened: ${opened.error}. Your workspace is unchanged.`);
      return;
    }
    replaceWorkspace(opened.workspace);
    setMessage(null);
    notify("info", `${file.name} is open${opened.migratedFrom !== undefined ? ` (converted from project format version ${opened.migratedFrom})` : ""}.`);
  };
  return (
    <section>
      <h2>Project file</h2>
      <p className="muted">Everything in one file: spec, part lists, column choices, shortlist.</p>
      <div className="button-row">
        <button type="button" onClick={save}>
          Save project file
        </button>
        <button type="button" onClick={() => input.current?.click()}>
          Open project file…
        </button>
        <input
          ref={input}
          type="file"
          accept=".json,application/json"
          className="visually-hidden"
          aria-label="Project file to open"
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file !== undefined) void open(file);
            e.target.value = "";
          }}
        />
      </div>
      {message !== null && (
        <p className="field-error" role="alert">
          {message}
        </p>
      )}
    </section>
  );
}
