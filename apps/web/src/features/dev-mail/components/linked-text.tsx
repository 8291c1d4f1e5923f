import { Fragment } from "react";

const urlPattern = /(https?:\/\/[^\s<>"']+)/g;
// Sentence punctuation right after a link belongs to the sentence, not the address.
const trailing = /[.,;:!?)\]]+$/;

/** Plain e-mail text with its web addresses turned into links a person can follow. */
export function LinkedText({ text }: { text: string }) {
  const parts = text.split(urlPattern);
  return (
    <>
      {parts.map((part, index) => {
        if (index % 2 === 0) return <Fragment key={index}>{part}</Fragment>;
        const tail = part.match(trailing)?.[0] ?? "";
        const href = tail ? part.slice(0, -tail.length) : part;
        return (
          <Fragment key={index}>
            <a href={href} className="break-all text-rust-deep underline underline-offset-2">
              {href}
            </a>
            {tail}
          </Fragment>
        );
      })}
    </>
  );
}
