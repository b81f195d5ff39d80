"use client";
import { useId, useRef, useState } from "react";
import { FileText, Paperclip } from "lucide-react";
import { ShopTime } from "@/components/shop-locale";
import {
  formatBytes,
  MAX_UPLOAD_BYTES,
  UPLOAD_ACCEPT,
  UPLOAD_SIZE_MESSAGE,
  type UploadView,
} from "@/lib/uploads/rules";

interface OrderFilesProps {
  orderId: string;
  /** What the server already knows about (from listOrderUploads). */
  files: UploadView[];
  /** Customers on their own order and the counter; the floor only looks. */
  canUpload: boolean;
}

type UploadState =
  | { phase: "idle" }
  | { phase: "uploading"; name: string; percent: number }
  | { phase: "error"; message: string }
  | { phase: "done"; name: string };

/** Sends one file with progress (fetch cannot report upload progress, XMLHttpRequest can). */
function sendFile(orderId: string, file: File, onProgress: (percent: number) => void): Promise<UploadView> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/orders/${encodeURIComponent(orderId)}/files`);
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(Math.round((e.loaded / e.total) * 100));
    };
    xhr.onload = () => {
      const body = xhr.response as {
        data?: UploadView;
        error?: { message?: string; fields?: Record<string, string> };
      } | null;
      if (xhr.status === 201 && body?.data) return resolve(body.data);
      reject(
        new Error(
          body?.error?.fields?.file ?? body?.error?.message ?? "The file could not be attached. Try again.",
        ),
      );
    };
    xhr.onerror = () =>
      reject(new Error("The upload did not reach the shop. Check your connection and try again."));
    const form = new FormData();
    form.set("file", file, file.name);
    xhr.send(form);
  });
}

/** The photos and measurement sheets of an order, with an upload control for those who may attach. */
export function OrderFiles({ orderId, files: initialFiles, canUpload }: OrderFilesProps) {
  const [files, setFiles] = useState(initialFiles);
  const [state, setState] = useState<UploadState>({ phase: "idle" });
  const input = useRef<HTMLInputElement>(null);
  const id = useId();
  const inputId = `${id}-file`;
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const uploading = state.phase === "uploading";

  async function onChange(event: React.ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    if (!file) return;
    if (file.size > MAX_UPLOAD_BYTES) {
      setState({
        phase: "error",
        message: `${UPLOAD_SIZE_MESSAGE} “${file.name}” is ${formatBytes(file.size)}.`,
      });
      event.target.value = "";
      return;
    }
    setState({ phase: "uploading", name: file.name, percent: 0 });
    try {
      const saved = await sendFile(orderId, file, (percent) =>
        setState({ phase: "uploading", name: file.name, percent }),
      );
      setFiles((current) => [...current, saved]);
      setState({ phase: "done", name: saved.filename });
    } catch (error) {
      setState({ phase: "error", message: error instanceof Error ? error.message : String(error) });
    } finally {
      if (input.current) input.current.value = "";
    }
  }

  return (
    <section aria-labelledby={`${id}-title`} className="card p-5">
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        Photos and measurement sheets
      </h2>
      {files.length === 0 ? (
        <p className="mt-2 text-sm text-ink-muted">Nothing attached yet.</p>
      ) : (
        <ul className="mt-3 divide-y divide-line">
          {files.map((f) => (
            <li key={f.id} className="flex items-center gap-3 py-2">
              <a
                href={f.url}
                target="_blank"
                rel="noopener"
                className="shrink-0"
                aria-hidden="true"
                tabIndex={-1}
              >
                {f.kind === "image" && f.contentType !== "image/heic" && f.contentType !== "image/heif" ? (
                  // A private, access-checked thumbnail: next/image would fetch it without the session.
                  // eslint-disable-next-line @next/next/no-img-element
                  <img
                    src={f.url}
                    alt=""
                    width={48}
                    height={48}
                    loading="lazy"
                    className="size-12 rounded border border-line object-cover"
                  />
                ) : (
                  <span className="flex size-12 items-center justify-center rounded border border-line bg-paper-sunk">
                    {f.kind === "pdf" ? (
                      <FileText className="size-6 text-steel-500" />
                    ) : (
                      <Paperclip className="size-6 text-steel-500" />
                    )}
                  </span>
                )}
              </a>
              <div className="min-w-0 text-sm">
                <a
                  href={f.url}
                  target="_blank"
                  rel="noopener"
                  className="block truncate font-medium underline underline-offset-2"
                >
                  {f.filename}
                </a>
                <span className="text-ink-muted">
                  {f.kind === "pdf" ? "PDF" : "Photo"} · {formatBytes(f.sizeBytes)} ·{" "}
                  <ShopTime at={f.createdAt} />
                  {f.uploadedBy && <> · {f.uploadedBy}</>}
                </span>
              </div>
            </li>
          ))}
        </ul>
      )}

      {canUpload && (
        <div className="no-print mt-4 border-t border-line pt-4">
          <label htmlFor={inputId} className="field-label">
            Attach a photo or measurement sheet
          </label>
          <input
            ref={input}
            id={inputId}
            name="file"
            type="file"
            accept={UPLOAD_ACCEPT}
            className="field-input"
            disabled={uploading}
            onChange={onChange}
            aria-invalid={state.phase === "error" ? true : undefined}
            aria-describedby={[hintId, state.phase === "error" ? errorId : null].filter(Boolean).join(" ")}
          />
          <p id={hintId} className="field-hint">
            JPEG, PNG, WebP, HEIC or PDF, up to 10 MB.
          </p>
          {state.phase === "error" && (
            <p id={errorId} className="field-error" role="alert">
              {state.message}
            </p>
          )}
          <div aria-live="polite" className="mt-2 text-sm">
            {uploading && (
              <div className="flex items-center gap-3">
                <progress
                  max={100}
                  value={state.percent}
                  className="h-2 w-40"
                  aria-label={`Uploading ${state.name}`}
                />
                <span>
                  Uploading {state.name}… {state.percent}%
                </span>
              </div>
            )}
            {state.phase === "done" && <span className="text-pass">Attached {state.name}.</span>}
          </div>
        </div>
      )}
    </section>
  );
}
