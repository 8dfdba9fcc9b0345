// The cause tree of the knowledge-base page. For seniors a failure mode moves to another component
// in two ways that do the same thing: drag it onto the component, or press its Move button and then
// the Put it here button of the component (keyboard and touch). Either posts the cause page's
// "move" intent; the page then reloads the tree from the server.
import { useEffect, useState, type DragEvent } from "react";
import { href, Link, useFetcher } from "react-router";
import { SYSTEM_LABEL, type Priority } from "~/domain/knowledge";
import type { FormAnswer } from "~/http/forms";
import { Fold } from "../fold";
import { PriorityMark } from "../priority";

type Node = {
  id: string;
  parentId: string | null;
  level: string;
  name: string;
  system: string;
  priority: Priority | null;
  retired: boolean;
};

const DRAG_TYPE = "application/x-ramplight-cause";

export function CauseTree({ tree, mayEdit }: { tree: Node[]; mayEdit: boolean }) {
  const fetcher = useFetcher<FormAnswer>();
  const [picked, setPicked] = useState<Node | null>(null);
  const [over, setOver] = useState<string | null>(null);
  const [said, setSaid] = useState("");
  const systems = tree.filter((n) => n.level === "system");
  const childrenOf = (id: string) => tree.filter((n) => n.parentId === id);
  const byId = new Map(tree.map((n) => [n.id, n]));

  // Escape puts a picked-up failure mode back.
  useEffect(() => {
    if (!picked) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") {
        setPicked(null);
        setSaid("Move cancelled.");
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [picked]);

  // The server's answer to the last move: its message, or the refusal beside nothing else.
  const answer = fetcher.state === "idle" ? fetcher.data : undefined;
  const answered = answer ? (Object.values(answer.errors ?? {})[0]?.[0] ?? answer.notice ?? "") : "";

  const moveTo = (cause: Node, component: Node) => {
    setPicked(null);
    setOver(null);
    if (cause.parentId === component.id)
      return setSaid(`“${cause.name}” is under “${component.name}” already.`);
    setSaid("");
    void fetcher.submit(
      { intent: "move", parentId: component.id },
      { method: "post", action: href("/kb/causes/:causeId", { causeId: cause.id }) },
    );
  };

  const dropProps = (component: Node) =>
    mayEdit
      ? {
          onDragOver: (e: DragEvent) => {
            if (!e.dataTransfer.types.includes(DRAG_TYPE)) return;
            e.preventDefault();
            setOver(component.id);
          },
          onDragLeave: () => setOver((o) => (o === component.id ? null : o)),
          onDrop: (e: DragEvent) => {
            const cause = byId.get(e.dataTransfer.getData(DRAG_TYPE));
            e.preventDefault();
            if (cause) moveTo(cause, component);
          },
        }
      : {};

  return (
    <>
      <p role="status" aria-live="polite" className="min-h-6 text-sm font-medium text-uv-700">
        {picked
          ? `Moving “${picked.name}”: press Put it here beside a component, or Escape to cancel.`
          : fetcher.state !== "idle"
            ? "Moving…"
            : said || answered}
      </p>
      {systems.map((sys) => (
        // A system's branch is drawn once it is opened: the whole tree is hundreds of rows.
        <Fold
          key={sys.id}
          className="mt-3 rounded-card border border-rule bg-card p-3"
          summaryClassName="min-h-tap cursor-pointer content-center font-semibold"
          summary={SYSTEM_LABEL[sys.system as keyof typeof SYSTEM_LABEL] ?? sys.name}
        >
          <ul className="mt-2 grid gap-2">
            {childrenOf(sys.id).map((comp) => (
              <li
                key={comp.id}
                data-testid={`component-${comp.id}`}
                className={`rounded-lg p-1 ${over === comp.id ? "outline-2 outline-uv-500" : ""}`}
                {...dropProps(comp)}
              >
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <p className="font-medium">
                    <Link
                      className="inline-flex min-h-tap items-center underline decoration-rule underline-offset-2"
                      to={href("/kb/causes/:causeId", { causeId: comp.id })}
                    >
                      {comp.name}
                    </Link>
                  </p>
                  {picked && picked.parentId !== comp.id && !comp.retired ? (
                    <button
                      type="button"
                      className="btn min-h-tap text-sm"
                      aria-label={`Put it here: under ${comp.name}`}
                      onClick={() => moveTo(picked, comp)}
                    >
                      Put it here
                    </button>
                  ) : null}
                </div>
                <ul className="ml-4 grid gap-1">
                  {childrenOf(comp.id).map((fm) => (
                    <li
                      key={fm.id}
                      id={`cause-${fm.id}`}
                      draggable={mayEdit && !fm.retired}
                      onDragStart={(e) => {
                        e.dataTransfer.setData(DRAG_TYPE, fm.id);
                        e.dataTransfer.effectAllowed = "move";
                      }}
                      className="flex items-center justify-between gap-2 text-graphite-800"
                    >
                      <Link
                        className="inline-flex min-h-tap items-center underline decoration-rule underline-offset-2"
                        to={href("/kb/causes/:causeId", { causeId: fm.id })}
                      >
                        {fm.name}
                      </Link>
                      <span className="flex items-center gap-2">
                        {fm.retired ? <span className="meta">retired</span> : null}
                        {fm.priority ? <PriorityMark priority={fm.priority} /> : null}
                        {mayEdit && !fm.retired ? (
                          <button
                            type="button"
                            className="btn min-h-tap text-sm"
                            aria-pressed={picked?.id === fm.id}
                            aria-label={`Move ${fm.name}`}
                            onClick={() => setPicked(picked?.id === fm.id ? null : fm)}
                          >
                            Move
                          </button>
                        ) : null}
                      </span>
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ul>
        </Fold>
      ))}
    </>
  );
}
