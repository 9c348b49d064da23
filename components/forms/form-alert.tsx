import { Notice } from "@/components/ui/notice";

// The one message at the top of a form when the server refused it for a reason that belongs to no single field.
export function FormAlert({ message, word = "Not saved" }: { message: string | null; word?: string }) {
  if (!message) return null;
  return (
    <Notice tone="blocks" word={word} role="alert">
      {message}
    </Notice>
  );
}
