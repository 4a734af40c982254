// Prints the role x action matrix as the markdown table that README.md carries.
// `npm run docs:roles`; a unit test fails when README.md and the matrix disagree.
import { matrixMarkdown } from '@pourgate/permissions';

if (process.argv.includes('--help')) console.log('usage: npm run docs:roles   (prints the role x action table for README.md)');
else console.log(matrixMarkdown());
