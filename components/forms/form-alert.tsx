import { Notice } from "@/components/ui/notice";

export function FormAlert({ message }: { message: string | null }) {
  if (!message) return null;
  return (
    <Notice tone="blocks" word="Not saved" role="alert">
      {message}
    </Notice>
  );
}
