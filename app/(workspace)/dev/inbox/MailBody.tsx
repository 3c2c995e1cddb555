import { Fragment } from "react";

const URL_PATTERN = /(https?:\/\/[^\s<>"']+)/g;

/** Plain-text mail with the app's own links made clickable (other URLs stay text). */
export function MailBody({ text, origin }: { text: string; origin: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <pre className="overflow-x-auto px-5 py-4 font-mono text-xs leading-relaxed whitespace-pre-wrap text-ink">
      {parts.map((part, i) =>
        i % 2 === 1 && (part === origin || part.startsWith(`${origin}/`)) ? (
          <a key={i} href={part} className="text-copper-700 underline">
            {part}
          </a>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </pre>
  );
}
