"use client";

/* eslint-disable @next/next/no-img-element -- a local preview (blob: URL) of the file being sent */
import { useEffect, useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { Notice } from "@/components/ui";
import { MAX_UPLOAD_BYTES, MAX_UPLOAD_MEGABYTES } from "@/lib/uploads/limits";
import { uploadPhoto, type UploadAnswer } from "./library-api";

type Props = { onUploaded: (answer: UploadAnswer) => void };

type State = { phase: "idle" } | { phase: "sending"; preview: string; progress: number } | { phase: "measuring"; preview: string };

const accept = { "image/jpeg": [".jpg", ".jpeg"], "image/png": [".png"], "image/webp": [".webp"], "image/avif": [".avif"] };

function describeRejection(rejection: FileRejection | undefined): string {
  const code = rejection?.errors[0]?.code;
  if (code === "file-too-large") return `That file is larger than ${MAX_UPLOAD_MEGABYTES} MB. Export the photo smaller and try again.`;
  if (code === "too-many-files") return "Drop one photo at a time.";
  return "That file isn't a photo we can use. Upload a JPEG, PNG, WebP or AVIF photo.";
}

/**
 * Drop or choose one sample photo: a preview straight away, the upload's progress, then the wait
 * while the server strips, resizes and measures it. The same checks run again on the server.
 */
export function PhotoDrop({ onUploaded }: Props) {
  const [state, setState] = useState<State>({ phase: "idle" });
  const [error, setError] = useState<string | null>(null);
  const preview = state.phase === "idle" ? null : state.preview;
  useEffect(() => () => void (preview && URL.revokeObjectURL(preview)), [preview]);

  const send = async (file: File) => {
    setError(null);
    const url = URL.createObjectURL(file);
    setState({ phase: "sending", preview: url, progress: 0 });
    try {
      const answer = await uploadPhoto(file, (progress) =>
        setState(progress >= 1 ? { phase: "measuring", preview: url } : { phase: "sending", preview: url, progress }),
      );
      onUploaded(answer);
    } catch (e) {
      setError(e instanceof Error ? e.message : "The upload didn't go through. Try again.");
    } finally {
      setState({ phase: "idle" });
    }
  };
  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    accept,
    maxSize: MAX_UPLOAD_BYTES,
    multiple: false,
    disabled: state.phase !== "idle",
    onDropAccepted: (files) => void (files[0] && send(files[0])),
    onDropRejected: (rejections) => setError(describeRejection(rejections[0])),
  });

  return (
    <div className="flex flex-col gap-3">
      <div
        {...getRootProps({
          className: `flex min-h-32 cursor-pointer flex-col items-center justify-center gap-2 rounded-lg border-2 border-dashed p-5 text-center ${isDragActive ? "border-ink bg-stone-100" : "border-line-strong bg-card hover:bg-stone-50"}`,
          "aria-label": "Sample photo: drop it here or press to choose a file",
        })}
        data-testid="photo-dropzone"
      >
        <input {...getInputProps()} />
        {state.phase === "idle" ? (
          <>
            <p className="font-medium text-ink">{isDragActive ? "Drop the photo to upload it" : "Drop a sample photo here, or choose one"}</p>
            <p className="text-sm text-stone-600">JPEG, PNG, WebP or AVIF, up to {MAX_UPLOAD_MEGABYTES} MB. Location and camera details are removed.</p>
          </>
        ) : (
          <div className="flex w-full items-center gap-4 text-left">
            <img src={state.preview} alt="The photo being uploaded" className="size-20 shrink-0 rounded-chip object-cover" />
            <div className="flex flex-1 flex-col gap-2" aria-live="polite">
              <p className="font-medium text-ink">{state.phase === "sending" ? "Uploading…" : "Measuring the colour…"}</p>
              <progress
                className="h-2 w-full accent-[var(--color-ink-soft)]"
                max={1}
                value={state.phase === "sending" ? state.progress : undefined}
                aria-label={state.phase === "sending" ? `Uploaded ${Math.round(state.progress * 100)}%` : "Measuring"}
              />
            </div>
          </div>
        )}
      </div>
      {error && (
        <Notice tone="problem" title="That photo wasn't added">
          {error}
        </Notice>
      )}
    </div>
  );
}
