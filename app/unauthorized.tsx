import Link from "next/link";
import { ProblemPage } from "@/components/layout/problem-page";

export default function Unauthorized() {
  return (
    <ProblemPage title="Please sign in">
      You need to <Link href="/sign-in">sign in</Link> to see this page.
    </ProblemPage>
  );
}
