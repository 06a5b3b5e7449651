import type { ReactNode } from "react";
import "./assess.css";

export default function AssessLayout({ children }: { children: ReactNode }) {
  return children;
}
