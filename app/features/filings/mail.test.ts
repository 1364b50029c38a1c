import { describe, expect, it } from "vitest";
import { filingMail } from "./mail";

describe("filingMail", () => {
  it("names the site, assessment, authority and filer, links the inbox, and escapes names in the HTML", () => {
    const m = filingMail("reg@example.test", { siteName: "Roof <b>A</b>", assessmentName: "Annual", authority: "Radio Office", filerName: "Ann & Co", organizationName: "Kestrel", url: "http://x.test/filings" });
    expect(m.subject).toBe("Filed to you: Roof <b>A</b>, Annual");
    expect(m.text).toContain("Ann & Co of Kestrel has filed the RF exposure assessment “Annual” of Roof <b>A</b> to Radio Office.");
    expect(m.text).toContain("Open your filings: http://x.test/filings");
    expect(m.html).toContain("Roof &lt;b&gt;A&lt;/b&gt;");
    expect(m.html).toContain("Ann &amp; Co");
    expect(m.html).not.toContain("<b>A</b>");
  });
});
