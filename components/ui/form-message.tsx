export function FieldError({ messages, id }: { messages?: string[]; id?: string }) {
  if (!messages?.length) return null;
  return (
    <p className="field-error" id={id}>
      {messages.join(" ")}
    </p>
  );
}

export function FormBanner({ kind, children }: { kind: "error" | "ok"; children: React.ReactNode }) {
  const cls =
    kind === "error" ? "border-alarm-600 bg-alarm-50 text-alarm-700" : "border-moss-600 bg-moss-50 text-moss-700";
  return (
    <div
      className={`rounded-md border px-3 py-2 text-sm ${cls}`}
      data-testid={kind === "error" ? "form-error" : "form-ok"}
      role="status"
    >
      {children}
    </div>
  );
}
