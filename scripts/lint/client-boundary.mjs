// A "use client" module is shipped to the browser: it may not import a server-only module, not even
// for its types (DTO types live in lib/dto, beside no server code).
const SERVER_ONLY = [
  /^server-only$/,
  /^@\/lib\/server(\/|$)/,
  /^@\/lib\/db(\/|$)/,
  /^@\/models(\/|$)/,
  /^(sequelize|pg|pg-boss|nodemailer|stripe)$/,
  /^node:/,
];

// A route's server actions ("actions.ts", "share-actions.ts"…) reach a client component as props from its page.
const ACTIONS = /(^|\/)([\w-]+-)?actions$/;
const typeOnly = (node) =>
  node.importKind === "type" || (node.specifiers?.length > 0 && node.specifiers.every((s) => s.importKind === "type"));

const isClientModule = (program) =>
  program.body.some((statement) => statement.type === "ExpressionStatement" && statement.directive === "use client");

/** @type {import("eslint").Rule.RuleModule} */
export const clientBoundary = {
  meta: {
    type: "problem",
    docs: { description: "Client components import no server-only module" },
    messages: {
      serverOnly: 'A client component cannot import "{{source}}": take the type from lib/dto or the value as a prop.',
      action: 'A client component takes server actions as props from its page: import only their types from "{{source}}".',
    },
    schema: [],
  },
  create(context) {
    let client = false;
    const check = (node) => {
      const source = node.source?.value;
      if (client && typeof source === "string" && SERVER_ONLY.some((pattern) => pattern.test(source))) {
        context.report({ node, messageId: "serverOnly", data: { source } });
      } else if (client && typeof source === "string" && ACTIONS.test(source) && !typeOnly(node)) {
        context.report({ node, messageId: "action", data: { source } });
      }
    };
    return {
      Program(program) {
        client = isClientModule(program);
      },
      ImportDeclaration: check,
      ExportNamedDeclaration: check,
      ExportAllDeclaration: check,
    };
  },
};
