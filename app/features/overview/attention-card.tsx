// The overview's attention list: what waits for this role, each line a link to its record.
import { Card } from "~/components/panels";
import { TextLink } from "~/components/text-link";
import { attentionWords, type AttentionList } from "./attention";

export function AttentionCard({ attention }: { attention: AttentionList }) {
  const words = attentionWords[attention.reason];
  const more = attention.total - attention.items.length;
  return (
    <Card title={`${words.title} (${attention.total})`}>
      {attention.items.length === 0 ? (
        <p className="text-graphite-600">{words.empty}</p>
      ) : (
        <ul className="divide-y divide-rule" aria-label={words.title}>
          {attention.items.map((item) => (
            <li key={item.key} className="py-2 first:pt-0 last:pb-0">
              <TextLink to={item.to} className="font-bold">
                {item.title}
              </TextLink>
              <p className="text-sm text-graphite-600">{item.detail}</p>
            </li>
          ))}
        </ul>
      )}
      {more > 0 ? <p className="mt-3 text-sm text-graphite-600">And {more} more.</p> : null}
    </Card>
  );
}
