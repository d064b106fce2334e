import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { effectiveCatalogInfo, findCatalogEntry } from "@/lib/server/catalogs";
import { idSchema, type Catalog, type InputType } from "@/lib/catalog/schema";
import { kindLabel } from "@/lib/catalog/kinds";
import { serializeCatalog } from "@/lib/catalog/loader";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";
import { makeFormat } from "@/lib/format/format";
import { FiguresTable, InputTypeBands, RelatedList, relatedEntries } from "@/components/catalog/entry-detail";
import { LifeSafetyCaution, MainsCaution } from "@/components/ui/life-safety-caution";
import { OriginBadge } from "@/components/catalog/origin-badge";
import { isLifeSafetyEntry } from "@/lib/catalog/life-safety";
import { orNotFound } from "@/lib/server/page-load";

export const metadata: Metadata = { title: "Catalog entry" };

export default async function CatalogEntryPage({ params }: { params: Promise<{ entryId: string }> }) {
  const { entryId } = await params;
  const { actor, allowed, reason } = await pageActor("catalog:read", `/catalog/${encodeURIComponent(entryId)}`);
  if (!allowed) return <Refusal reason={reason} />;
  const id = idSchema.safeParse(entryId);
  if (!id.success) notFound();
  const found = await orNotFound(findCatalogEntry(actor.organisationId, id.data));
  const { catalog } = await effectiveCatalogInfo(actor.organisationId);
  const { kind, entry } = found;
  const related = relatedEntries(catalog, kind, entry);
  const mainsFed = kind === "powerSupplies" || kind === "panels" || (kind === "expansionBoards" && "ownSupply" in entry && !!entry.ownSupply);

  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/catalog" className="text-signal underline underline-offset-2">
          ← Catalog
        </Link>
      </p>
      <PageHeader
        title={entry.name}
        subtitle={
          <span className="inline-flex flex-wrap items-center gap-2">
            <span>{kindLabel[kind]}</span>
            <code className="font-mono text-xs">{entry.id}</code>
            <OriginBadge origin={found.origin} version={found.upload?.version} />
          </span>
        }
      />
      {isLifeSafetyEntry(catalog, kind, entry) ? <LifeSafetyCaution className="mb-4" /> : null}
      {mainsFed ? <MainsCaution className="mb-4" /> : null}
      <p className="mb-4 max-w-3xl text-sm">{entry.description}</p>
      <div className="mb-6 grid grid-cols-1 gap-6 lg:grid-cols-3">
        <Card className="lg:col-span-2">
          <h2 className="mb-2 font-semibold">Figures</h2>
          <FiguresTable kind={kind} entry={entry} money={makeFormat(actor.settings).money} />
        </Card>
        {related.length ? (
          <Card>
            <h2 className="mb-2 font-semibold">Related</h2>
            <RelatedList items={related} />
          </Card>
        ) : null}
      </div>
      {kind === "inputTypes" ? (
        <section aria-labelledby="bands-heading">
          <h2 id="bands-heading" className="mb-3 text-lg font-semibold">
            Bands by wiring scheme
          </h2>
          <InputTypeBands inputType={entry as InputType} />
        </section>
      ) : null}
      <details className="mt-4">
        <summary className="cursor-pointer text-sm font-medium">This entry as YAML (a start for your own upload)</summary>
        <pre className="mt-2 relative overflow-x-auto rounded-md border border-line bg-white p-3 font-mono text-xs">{serializeCatalog({ [kind]: [entry] } as unknown as Catalog)}</pre>
      </details>
    </>
  );
}
