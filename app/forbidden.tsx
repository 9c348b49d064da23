import { FORBIDDEN_TEXT, ProblemPage } from "@/components/layout/problem-page";

export default function Forbidden() {
  return <ProblemPage title={FORBIDDEN_TEXT.title}>{FORBIDDEN_TEXT.body}</ProblemPage>;
}
