// Prints the role x action matrix as the markdown table that README.md carries.
// `npm run docs:roles`; a unit test fails when README.md and the matrix disagree.
import { matrixMarkdown } from '@pourgate/permissions';

console.log(matrixMarkdown());
