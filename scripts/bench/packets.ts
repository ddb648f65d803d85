// `npm run bench:packets [-- --runs 15]`: the median time to draw a whole permit packet of a demo
// project (its generated sheets through renderPacketPdf, then the demo data sheets appended as the
// worker does), beside the median for a one-page document drawn the same way (the packet's own cover
// sheet alone, through renderPdf), and their ratio; then the same for the interconnection packet.
// Prints figures; asserts nothing. Needs no database or storage: the data sheets are made in memory.
import os from "node:os";
import { performance } from "node:perf_hooks";
import { createElement } from "react";
import { appendPdfs } from "@/lib/documents/packets/merge-datasheets";
import { packetFacts } from "@/lib/documents/packets/printed";
import { renderPacketPdf } from "@/lib/documents/packets/render";
import { planInterconnectionSheets, planPermitSheets } from "@/lib/documents/packets/sheet-plan";
import { renderPdf } from "@/lib/documents/render";
import { printableDeep } from "@/lib/documents/text";
import { demoDatasheetPdf } from "@/lib/seed/demo-datasheets";
import { interconnectionSheetPages } from "@/templates/pdf/packets/interconnection-packet";
import { PacketDocument } from "@/templates/pdf/packets/packet-document";
import { permitSheetPages } from "@/templates/pdf/packets/permit-packet";
import type { PacketKind } from "@/lib/domain/stored-values";
import { packetFixture } from "@/tests/support/packet-fixture";

const args = process.argv.slice(2);
const runs = args.includes("--runs") ? Number(args[args.indexOf("--runs") + 1]) : 15;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2;
};

async function timed(fn: () => Promise<unknown>): Promise<number[]> {
  await fn(); // the first draw loads fonts and warms the code: not counted
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const started = performance.now();
    await fn();
    times.push(performance.now() - started);
  }
  return times;
}

async function bench(kind: PacketKind) {
  const input = packetFixture({ kind });
  const equipment = [input.equipment.module, ...input.equipment.inverters.map((l) => l.item), input.equipment.device].filter(
    (e) => e !== null,
  );
  // The worker appends the data sheets to a permit packet only.
  const datasheets =
    kind === "permit"
      ? await Promise.all(equipment.map(async (e) => ({ title: `${e.maker} ${e.model}`, bytes: await demoDatasheetPdf(e) })))
      : [];
  const whole = async () => {
    const sheets = await renderPacketPdf(input);
    return appendPdfs(sheets, datasheets, { footer: `Attachment to project ${input.project.number}` });
  };
  const printable = printableDeep(input);
  const packet = { ...printable, facts: packetFacts(printable) };
  const [cover] =
    kind === "permit" ? permitSheetPages(packet, planPermitSheets(packet)) : interconnectionSheetPages(packet, planInterconnectionSheets());
  const onePage = () => renderPdf(createElement(PacketDocument, { info: packet.facts.documentInfo }, cover!.page));

  const { pageCount } = await whole();
  const packetMs = median(await timed(whole));
  const pageMs = median(await timed(onePage));
  return { kind, pageCount, packetMs, pageMs, ratio: packetMs / pageMs };
}

console.log(
  `\n${runs} runs each after one warm-up; load average ${os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(" ")} on ${os.cpus().length} cores.\n`,
);
console.log("| packet | pages | median packet | median one page | ratio |\n|---|---|---|---|---|");
for (const kind of ["permit", "interconnection"] as const) {
  const r = await bench(kind);
  console.log(`| ${r.kind} | ${r.pageCount} | ${r.packetMs.toFixed(0)} ms | ${r.pageMs.toFixed(1)} ms | ${r.ratio.toFixed(1)}× |`);
}
