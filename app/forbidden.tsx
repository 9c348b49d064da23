import { ProblemPage } from "@/components/layout/problem-page";

export default function Forbidden() {
  return <ProblemPage title="Not available to your role">This page is for other members of the clinic.</ProblemPage>;
}
