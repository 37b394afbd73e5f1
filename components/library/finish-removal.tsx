"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button, Card, Notice } from "@/components/ui";
import { libraryKeys, requestJson, sendJson } from "./library-api";

type Props = { finishId: string; archived: boolean; removalBlock: string | null };

/**
 * Archive hides a finish from new work and keeps it for everything that already uses it.
 * Removing is only for a finish nothing uses; one in a specification can never go.
 */
export function FinishRemoval({ finishId, archived, removalBlock }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const url = `/api/finishes/${encodeURIComponent(finishId)}`;
  const archive = useMutation({
    mutationFn: (next: boolean) => requestJson(url, sendJson("PATCH", { archived: next })),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: libraryKeys.all });
      router.refresh();
    },
  });
  const remove = useMutation({
    mutationFn: () => requestJson(url, sendJson("DELETE")),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: libraryKeys.all });
      router.push("/studio/library");
    },
  });
  const problem = archive.error ?? remove.error;
  return (
    <Card title={archived ? "Archived" : "Archive"} level={2}>
      <div className="flex flex-col gap-3">
        <p className="text-ink-soft">
          {archived
            ? "This finish is kept for the boards, decisions and specifications that use it, but isn't offered for new work."
            : "Archiving keeps the finish wherever it is used and takes it out of the library table and similar-colour searches."}
        </p>
        <Button type="button" variant="secondary" pending={archive.isPending} onClick={() => archive.mutate(!archived)}>
          {archived ? "Bring back into the library" : "Archive this finish"}
        </Button>
        {removalBlock ? (
          <p className="text-sm text-stone-600">{removalBlock}</p>
        ) : (
          <Button
            type="button"
            variant="danger"
            pending={remove.isPending}
            onClick={() => {
              if (window.confirm("Remove this finish for good? Nothing uses it, and this can't be undone.")) remove.mutate();
            }}
          >
            Remove for good
          </Button>
        )}
        {problem && <Notice tone="problem">{problem.message}</Notice>}
      </div>
    </Card>
  );
}
