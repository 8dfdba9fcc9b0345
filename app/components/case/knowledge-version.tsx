import { Form } from "react-router";

/**
 * Which knowledge-base version ranks this case. A case keeps the version it was opened with, so a
 * senior's change never moves a ranking under a technician's hands; when a newer version exists,
 * whoever works on the case can ask for it here.
 */
export function KnowledgeVersion(props: {
  /** The version the ranking on this page was made with. */
  rankedWith: number;
  /** The version the case asked for; differs from rankedWith only when that version was not kept. */
  pinned: number;
  newest: number;
  /** Evidence naming items the version does not have, left out of the ranking. */
  setAside: number;
  canWork: boolean;
}) {
  const { rankedWith, pinned, newest, setAside, canWork } = props;
  const behind = rankedWith < newest;
  if (!behind && !setAside && rankedWith === pinned)
    return (
      <p className="text-sm text-graphite-600" data-testid="kb-version">
        Ranked with knowledge-base version {rankedWith}, the newest.
      </p>
    );
  return (
    <section
      className="rounded-lg border border-rule bg-card p-3 text-sm"
      aria-labelledby="kb-version-title"
      data-testid="kb-version"
    >
      <h2 id="kb-version-title" className="font-semibold">
        Ranked with knowledge-base version {rankedWith}
      </h2>
      {rankedWith !== pinned ? (
        <p className="mt-1">
          Version {pinned}, which this case was opened with, was not kept; it is ranked with version{" "}
          {rankedWith}.
        </p>
      ) : null}
      {behind ? (
        <p className="mt-1">
          Version {newest} is newer. This case keeps version {rankedWith}, and so the ranking it was worked
          with, until someone working on it asks for the newer one.
        </p>
      ) : null}
      {setAside ? (
        <p className="mt-1 font-medium">
          {setAside === 1 ? "One piece of evidence names" : `${setAside} pieces of evidence name`} something
          version {rankedWith} does not have; {setAside === 1 ? "it is" : "they are"} left out of the ranking
          until the case is ranked with the newest version.
        </p>
      ) : null}
      {behind && canWork ? (
        <Form method="post" className="mt-2">
          <input type="hidden" name="intent" value="newest-knowledge" />
          <button
            type="submit"
            className="min-h-tap rounded-lg border-2 border-uv-600 px-4 font-semibold text-uv-700"
          >
            Rank with version {newest}
          </button>
        </Form>
      ) : null}
    </section>
  );
}
