import { Fragment } from 'react';

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** Plain text with its http(s) addresses made into links (for captured e-mails). */
export function LinkifiedText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <pre className="whitespace-pre-wrap break-words font-mono text-xs leading-5">
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <a key={index} href={part} className="text-accent underline">
            {part}
          </a>
        ) : (
          <Fragment key={index}>{part}</Fragment>
        ),
      )}
    </pre>
  );
}
