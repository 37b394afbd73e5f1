"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { Button, describeField, Field, Input, Notice, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { MissingSuppliers } from "@/components/suppliers/missing-suppliers";
import { ApiError, libraryKeys, requestJson } from "./library-api";

type Report = { dryRun: boolean; total: number; valid: number; imported: number; rejected: { line: number; name: string; errors: string[] }[]; missingSuppliers?: string[] };

async function send(file: File, dryRun: boolean): Promise<Report> {
  const form = new FormData();
  form.set("file", file);
  try {
    return await requestJson<Report>(`/api/finishes/import${dryRun ? "?dryRun=1" : ""}`, { method: "POST", body: form });
  } catch (error) {
    // An import refused for bad rows still answers with the list of them.
    if (error instanceof ApiError && Array.isArray(error.body.rejected)) return error.body as unknown as Report;
    throw error;
  }
}

const csvHint = "Up to 10,000 rows and 5 MB.";

/** Check a spreadsheet first (nothing is written), then import it: all rows or none. */
export function CsvImport() {
  const queryClient = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const check = useMutation({ mutationFn: (f: File) => send(f, true) });
  const run = useMutation({
    mutationFn: (f: File) => send(f, false),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.all }),
  });
  const report = run.data ?? check.data;
  const problem = run.error ?? check.error;
  const ready = check.data && check.data.rejected.length === 0 && check.data.valid > 0 && !run.data;
  return (
    <div className="flex flex-col gap-5">
      <Field htmlFor="csv-file" label="Spreadsheet (CSV)" hint={csvHint}>
        <Input
          {...describeField("csv-file", { hint: csvHint })}
          type="file"
          accept=".csv,text/csv"
          className="py-2"
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            check.reset();
            run.reset();
          }}
        />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="button" variant={ready ? "secondary" : "primary"} disabled={!file} pending={check.isPending} onClick={() => file && check.mutate(file)}>
          Check the file
        </Button>
        {ready && file && (
          <Button type="button" pending={run.isPending} onClick={() => run.mutate(file)}>
            Import {check.data.valid} {check.data.valid === 1 ? "finish" : "finishes"}
          </Button>
        )}
      </div>
      <div aria-live="polite" className="flex flex-col gap-4">
        {problem && <Notice tone="problem" title="That file can't be imported">{problem.message}</Notice>}
        {run.data && run.data.imported > 0 && (
          <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">
            Imported {run.data.imported} {run.data.imported === 1 ? "finish" : "finishes"}. <Link href="/studio/library" className="underline">See them in the library</Link>.
          </p>
        )}
        {report && !run.data?.imported && report.rejected.length === 0 && report.valid > 0 && (
          <p className="text-ink">All {report.valid} rows are ready. Nothing has been imported yet.</p>
        )}
        {report && report.total === 0 && <p className="text-ink-soft">The file has a header but no rows.</p>}
        {report && report.rejected.length > 0 && (
          <>
            {file && report.missingSuppliers && report.missingSuppliers.length > 0 && (
              <MissingSuppliers
                names={report.missingSuppliers}
                onAdded={() => {
                  run.reset();
                  check.mutate(file);
                }}
              />
            )}
            <Notice tone="caution" title={`${report.rejected.length} of ${report.total} rows need fixing`}>
              An import with any bad row imports nothing. Fix these rows in the spreadsheet and check it again.
            </Notice>
            <Table caption="Rows that would be rejected, and why">
              <THead>
                <Tr>
                  <Th numeric>Line</Th>
                  <Th>Name</Th>
                  <Th>What to fix</Th>
                </Tr>
              </THead>
              <TBody>
                {report.rejected.map((r) => (
                  <Tr key={r.line}>
                    <Td numeric>{r.line}</Td>
                    <Td>{r.name || <span className="text-stone-600">(no name)</span>}</Td>
                    <Td>
                      <ul className="flex flex-col gap-1">
                        {r.errors.map((e) => (
                          <li key={e}>{e}</li>
                        ))}
                      </ul>
                    </Td>
                  </Tr>
                ))}
              </TBody>
            </Table>
          </>
        )}
      </div>
    </div>
  );
}
