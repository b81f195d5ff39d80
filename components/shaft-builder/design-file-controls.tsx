"use client";

import { useRef, useState } from "react";
import type { UseFormReturn } from "react-hook-form";
import { Download, FileUp } from "lucide-react";
import type { Catalogue, DesignFile } from "@/lib/driveline";
import { Alert } from "@/components/ui/alert";
import { tryLoadBuilderCore } from "./load-builder-core";
import { designFileJson, designFileName, designFileToForm, type BuilderForm } from "./model";

type UploadState =
  | { kind: "idle" }
  | { kind: "ok"; fileName: string }
  | { kind: "error"; fileName: string; messages: string[] };

/**
 * The design file in and out of the builder: download what is on screen, or load a file into the
 * form (read and checked in the browser by the core's parser; a bad file changes nothing).
 */
export function useDesignFile({
  methods,
  catalogue,
  markChanged,
}: {
  methods: UseFormReturn<BuilderForm>;
  catalogue: Catalogue;
  markChanged: () => void;
}) {
  const [upload, setUpload] = useState<UploadState>({ kind: "idle" });

  function download(design: DesignFile) {
    const blob = new Blob([designFileJson(design)], { type: "application/json" });
    const url = URL.createObjectURL(blob);
    const a = document.createElement("a");
    a.href = url;
    a.download = designFileName(methods.getValues("name"));
    document.body.appendChild(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(url), 1000);
  }

  async function load(file: File) {
    let input: unknown;
    const core = await tryLoadBuilderCore();
    if (!core) {
      setUpload({
        kind: "error",
        fileName: file.name,
        messages: ["The shop could not be reached to check the file. Check the connection, then try again."],
      });
      return;
    }
    try {
      input = JSON.parse(await file.text());
    } catch {
      setUpload({
        kind: "error",
        fileName: file.name,
        messages: ["design: the file is not JSON (expected a Yokeline design file)"],
      });
      return;
    }
    const parsed = core.parseDesign(input, { catalogue });
    if (!parsed.ok) {
      setUpload({ kind: "error", fileName: file.name, messages: parsed.issues.map((i) => i.message) });
      return;
    }
    const next = designFileToForm(parsed.design, { application: methods.getValues("application") });
    methods.reset({ ...next, name: parsed.design.name ?? methods.getValues("name") });
    setUpload({ kind: "ok", fileName: file.name });
    markChanged();
  }

  return { upload, download, load, clear: () => setUpload({ kind: "idle" }) };
}

export type DesignFileControls = ReturnType<typeof useDesignFile>;

/** "Download design file" (once the form is valid) and "Upload design file". */
export function DesignFileButtons({
  controls,
  design,
}: {
  controls: DesignFileControls;
  /** The valid design on screen, or null while a field needs fixing. */
  design: DesignFile | null;
}) {
  const fileInput = useRef<HTMLInputElement>(null);
  return (
    <div className="flex flex-wrap items-center gap-2">
      <button
        type="button"
        className="btn-quiet"
        onClick={() => design && controls.download(design)}
        disabled={!design}
        title={design ? undefined : "Fix the highlighted fields first"}
      >
        <Download className="size-4" aria-hidden="true" /> Download design file
      </button>
      <button type="button" className="btn-quiet" onClick={() => fileInput.current?.click()}>
        <FileUp className="size-4" aria-hidden="true" /> Upload design file
      </button>
      <input
        ref={fileInput}
        type="file"
        accept="application/json,.json"
        className="sr-only"
        tabIndex={-1}
        aria-label="Upload a design file"
        data-testid="design-upload"
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) void controls.load(file);
          e.target.value = "";
        }}
      />
    </div>
  );
}

/** What became of the last uploaded file: loaded, or why not (nothing entered was changed). */
export function UploadNotice({ controls }: { controls: DesignFileControls }) {
  const { upload } = controls;
  if (upload.kind === "error")
    return (
      <Alert tone="error" title={`${upload.fileName} was not loaded — nothing you entered has changed.`}>
        <ul className="list-disc pl-4" data-testid="upload-errors">
          {upload.messages.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      </Alert>
    );
  if (upload.kind === "ok")
    return (
      <Alert tone="success" title={`Loaded ${upload.fileName}.`}>
        Check the values, then save the draft.
      </Alert>
    );
  return null;
}
