import { NOT_FOUND_TEXT, ProblemPage } from "@/components/layout/problem-page";

export default function NotFound() {
  return <ProblemPage title={NOT_FOUND_TEXT.title}>{NOT_FOUND_TEXT.body}</ProblemPage>;
}
