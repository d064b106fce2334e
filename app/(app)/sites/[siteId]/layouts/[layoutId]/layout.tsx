import { Suspense, type ReactNode } from "react";
import { currentActor } from "@/lib/server/session";
import { findLayoutForReview } from "@/lib/server/sheets";
import { idParam } from "@/lib/server/route";
import { can } from "@/lib/auth/permissions";
import { LayoutFrameHeader } from "@/components/layout-frame/layout-frame-header";
import { LayoutFrameSkeleton } from "@/components/layout-frame/layout-frame-skeleton";

// One frame for the editor, review, terminal sheet and commissioning: the trail, name, state and tabs stay in
// the same place on each. Each page still checks its own permission and answers its own 404.

async function FrameHeader({ siteId, layoutId }: { siteId: string; layoutId: string }) {
  const actor = await currentActor();
  const sid = idParam.safeParse(siteId);
  const lid = idParam.safeParse(layoutId);
  if (!actor || !sid.success || !lid.success || !(can(actor.role, "layout:read") || can(actor.role, "sheet:read"))) return null;
  const ref = await findLayoutForReview(actor, lid.data).catch(() => null);
  if (!ref || ref.layout.siteId !== sid.data) return null;
  return <LayoutFrameHeader site={{ id: ref.site.id, name: ref.site.name }} layout={{ id: ref.layout.id, name: ref.layout.name }} review={ref.review} />;
}

export default async function LayoutFrame({ children, params }: { children: ReactNode; params: Promise<{ siteId: string; layoutId: string }> }) {
  const { siteId, layoutId } = await params;
  return (
    <>
      <Suspense fallback={<LayoutFrameSkeleton />}>
        <FrameHeader siteId={siteId} layoutId={layoutId} />
      </Suspense>
      {children}
    </>
  );
}
