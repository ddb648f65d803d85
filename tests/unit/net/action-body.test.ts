import { describe, expect, test } from "vitest";
import { actionBodyProblem } from "@/lib/net/action-body";

// The reply encoding of React's client (react-server-dom, encodeReply / parseModelString): "$$" escapes
// a leading "$"; "$undefined", "$NaN", "$Infinity", "$-Infinity", "$-0" and "$D" stand for values JSON
// lacks; other "$" prefixes are references into a multipart reply.
describe("actionBodyProblem", () => {
  test.each([
    ['[{"projectId":"a","note":"plain"}]'],
    ['[{"price":"$$5.00"}]'],
    ['[{"a":"$undefined","b":"$NaN","c":"$Infinity","d":"$-Infinity","e":"$-0"}]'],
    ['[{"when":"$D2026-12-05T10:00:00.000Z"}]'],
    ["[]"],
  ])("accepts %s", (body) => expect(actionBodyProblem(body)).toBeNull());

  test.each([
    ["not json", /not JSON/],
    ['{"projectId":"a"}', /not a list/],
    ['[{"x":"$@1"}]', /refers to parts/],
    ['[{"x":"$Q1"}]', /refers to parts/],
    ['[{"x":["$K0"]}]', /refers to parts/],
    ['["$h1"]', /refers to parts/],
    ['["$"]', /refers to parts/],
    ['["$1"]', /refers to parts/],
    ['["$Dnot-a-date"]', /refers to parts/],
  ])("refuses %s", (body, problem) => expect(actionBodyProblem(body)).toMatch(problem));
});
