import { FORBIDDEN_TEXT, ProblemContent } from "@/components/layout/problem-page";

// Rendered inside this group's layout, which already has the header and the <main> landmark.
export default function Forbidden() {
  return <ProblemContent title={FORBIDDEN_TEXT.title}>{FORBIDDEN_TEXT.body}</ProblemContent>;
}
