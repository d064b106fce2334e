import type { Metadata } from "next";
import { pageActor } from "@/lib/server/session";
import { effectiveCatalogInfo, entryOrigin, listUploads } from "@/lib/server/catalogs";
import { MAX_UPLOAD_BYTES } from "@/lib/catalog/upload-schema";
import { can, refusal } from "@/lib/auth/permissions";
import { catalogSummary } from "@/lib/catalog/figures";
import { findEntry } from "@/lib/catalog/loader";
import { formatCatalogError } from "@/lib/catalog/errors";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";
import { CatalogBrowser } from "@/components/catalog/catalog-browser";
import { CatalogUploadForm } from "@/components/catalog/catalog-upload";
import { UploadVersions } from "@/components/catalog/upload-versions";
import { makeFormat } from "@/lib/format/format";
import { LifeSafetyCaution } from "@/components/ui/life-safety-caution";
import { isLifeSafetyEntry } from "@/lib/catalog/life-safety";
import { tableStateFrom, type CatalogRow } from "@/components/catalog/catalog-table-model";

export const metadata: Metadata = { title: "Catalog" };

export default async function CatalogPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { actor, allowed, reason } = await pageActor("catalog:read", "/catalog");
  if (!allowed) return <Refusal reason={reason} />;
  const [info, uploads, params] = await Promise.all([effectiveCatalogInfo(actor.organisationId), listUploads(actor.organisationId), searchParams]);
  const rows: CatalogRow[] = catalogSummary(info.catalog).map((r) => ({
    ...r,
    origin: entryOrigin(info, { kind: r.kind, id: r.id }),
    lifeSafety: isLifeSafetyEntry(info.catalog, r.kind, findEntry(info.catalog, r.id)!.entry),
  }));
  const canUpload = can(actor.role, "catalog:upload");

  return (
    <>
      <PageHeader
        title="Catalog"
        subtitle={
          info.upload
            ? `The hardware ${actor.organisationName} designs with: the shipped profiles plus your organisation's upload (version ${info.upload.version}, ${info.upload.fileName}).`
            : `The hardware ${actor.organisationName} designs with: the shipped profiles. Generic profiles, not real products.`
        }
        actions={
          <a href="#organisation-catalog" className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium text-signal hover:bg-slate-50">
            {canUpload ? "Upload your own profiles" : "Your organisation's catalog file"}
          </a>
        }
      />
      <LifeSafetyCaution className="mb-4" />
      {info.problem ? (
        <div role="alert" className="mb-4 rounded-md border border-fault bg-fault-soft p-3 text-sm">
          <p className="font-medium text-fault">
            Your latest upload (version {info.problem.version}) no longer validates together with the shipped catalog, so the shipped catalog alone is in use. Upload a corrected file.
          </p>
          <ul className="mt-1 font-mono text-xs">
            {info.problem.errors.slice(0, 10).map((e, i) => (
              <li key={i}>{formatCatalogError(e)}</li>
            ))}
          </ul>
        </div>
      ) : null}
      <CatalogBrowser rows={rows} initial={tableStateFrom(params)} />

      <h2 id="organisation-catalog" className="mt-8 mb-3 scroll-mt-4 text-lg font-semibold">
        Your organisation&apos;s catalog file
      </h2>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-5">
        {canUpload ? (
          <Card className="lg:col-span-2">
            <h3 className="mb-2 font-semibold">Upload a new version</h3>
            <CatalogUploadForm maxBytes={MAX_UPLOAD_BYTES} />
          </Card>
        ) : null}
        <Card className={canUpload ? "lg:col-span-3" : "lg:col-span-5"}>
          <h3 className="mb-2 font-semibold">Versions</h3>
          <UploadVersions uploads={uploads} inUseVersion={info.problem ? null : (info.upload?.version ?? null)} when={makeFormat(actor.settings).dateTime} />
          {!canUpload ? <p className="mt-3 text-xs text-slate-500">{refusal(actor.role, "catalog:upload")}</p> : null}
        </Card>
      </div>
    </>
  );
}
