import { Bone, LoadingPage } from "@/components/ui/skeleton";
import { Card } from "@/components/ui/card";

// Without this the editor's loading state (one folder up) would stand in for the review page.
export default function ReviewLoading() {
  return (
    <LoadingPage what="the review">
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_26rem]">
        <div className="flex flex-col gap-4">
          {["Where this layout stands", "What you can do", ""].map((title, i) => (
            <Card key={i}>
              {title ? <h2 className="text-lg font-semibold">{title}</h2> : <Bone className="h-6 w-56" />}
              <Bone className="mt-3 h-9 w-full" />
              <Bone className="mt-2 h-4 w-3/4" />
            </Card>
          ))}
        </div>
        <div className="flex flex-col gap-4">
          {["Comments", "Decisions"].map((title) => (
            <Card key={title}>
              <h2 className="text-lg font-semibold">{title}</h2>
              {[0, 1, 2].map((i) => (
                <Bone key={i} className="mt-3 h-10 w-full" />
              ))}
            </Card>
          ))}
        </div>
      </div>
    </LoadingPage>
  );
}
