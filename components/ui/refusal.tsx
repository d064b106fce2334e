/** The plain explanation a member sees when their role lacks a permission (the API answers 403). */
export function Refusal({ reason }: { reason: string }) {
  return (
    <div role="alert" data-testid="refusal" className="mx-auto mt-12 max-w-xl rounded-lg border border-warn bg-warn-soft p-6">
      <h1 className="text-lg font-semibold text-warn">Not available to your role</h1>
      <p className="mt-2 text-sm">{reason}</p>
    </div>
  );
}
