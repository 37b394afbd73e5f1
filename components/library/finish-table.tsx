"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useCallback, useEffect, useState } from "react";
import { EmptyState, LinkButton, Notice, Spinner, Table, TBody, Th, THead, Tr } from "@/components/ui";
import type { FinishListQuery, FinishSortKey } from "@/lib/validation/finish";
import { FinishFilters, type SupplierOption } from "./finish-filters";
import { FinishCards, FinishRows } from "./finish-rows";
import { fetchFinishPage, libraryKeys, toSearch } from "./library-api";
import { Pager } from "./pager";
import { SortHeader } from "./sort-header";

type Props = { initialQuery: FinishListQuery; suppliers: SupplierOption[] };

/**
 * The studio's finishes: first page rendered from the server's prefetch, then read from
 * GET /api/finishes as the designer filters, sorts and pages. The address keeps the view, so a
 * reload or a shared link shows the same page.
 */
export function FinishTable({ initialQuery, suppliers }: Props) {
  const [query, setQuery] = useState(initialQuery);
  const { data, isFetching, isError, error } = useQuery({
    queryKey: libraryKeys.page(query),
    queryFn: () => fetchFinishPage(query),
    placeholderData: keepPreviousData,
  });

  useEffect(() => {
    const url = `/studio/library${toSearch(query)}`;
    if (url !== window.location.pathname + window.location.search) window.history.replaceState(null, "", url);
  }, [query]);

  const change = useCallback((next: Partial<FinishListQuery>) => setQuery((q) => ({ ...q, ...next })), []);
  const sortBy = (column: FinishSortKey) =>
    change({ sort: column, dir: query.sort === column && query.dir === "asc" ? "desc" : "asc", page: 1 });
  const header = (label: string, column: FinishSortKey, numeric = false) => (
    <SortHeader label={label} column={column} sort={query.sort} dir={query.dir} numeric={numeric} onSort={sortBy} />
  );

  return (
    <div className="flex flex-col gap-4">
      <FinishFilters query={query} suppliers={suppliers} onChange={change} />
      {isError && <Notice tone="problem" title="The library didn't load">{error.message}</Notice>}
      {data && data.total === 0 ? (
        <EmptyState title="No finishes match" action={<LinkButton href="/studio/library/new">Add a finish</LinkButton>}>
          Try fewer words or another category, or add the finish you are looking for.
        </EmptyState>
      ) : data ? (
        <div aria-busy={isFetching} className={isFetching ? "opacity-70 transition-opacity" : undefined}>
          <Table caption="Finishes in the library" captionHidden className="hidden md:block [&_td]:px-2.5 [&_th]:px-2.5 [&_th]:align-middle">
            <THead>
              <Tr>
                <Th>
                  <span className="sr-only">Swatch</span>
                </Th>
                {header("Name", "name")}
                {header("Category", "category")}
                {header("Supplier", "supplier")}
                {header("Code", "code")}
                {header("Finish", "surface")}
                {header("Cost per unit, excluding GST/tax", "price", true)}
                {header("Lead time", "lead", true)}
                {header("LRV", "lrv", true)}
                <Th>Cautions</Th>
              </Tr>
            </THead>
            <TBody>
              <FinishRows items={data.items} />
            </TBody>
          </Table>
          <div className="md:hidden">
            <FinishCards items={data.items} />
          </div>
        </div>
      ) : (
        <Spinner label="Loading the library" />
      )}
      {data && data.total > 0 && (
        <div className="flex items-center gap-3">
          <div className="flex-1">
            <Pager page={query.page} pageSize={query.pageSize} total={data.total} onPage={(page) => change({ page })} />
          </div>
          {isFetching && <Spinner label="Updating" />}
        </div>
      )}
    </div>
  );
}
