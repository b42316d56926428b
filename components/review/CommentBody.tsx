import { splitMentions } from '@/lib/workflow/mentions';

/** A comment's text with its @mentions set apart; line breaks kept. */
export function CommentBody({ text }: { text: string }) {
  return (
    <p className="whitespace-pre-wrap break-words text-sm">
      {splitMentions(text).map((part, i) =>
        part.mention ? (
          <span key={i} className="font-medium text-ink">
            {part.text}
          </span>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </p>
  );
}
