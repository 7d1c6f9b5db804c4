import '/work/main/src/families/index.ts';
import '/work/main/src/library/index.ts';
import { evaluate } from '/work/main/src/language/expr/index.ts';
import { valueToText } from '/work/main/src/values/operations.ts';
import {it} from "vitest"; it("p",()=>{for (const e of ['len(subset([1,3,4]))', 'subset([1,3,4])[2]', 'len(word([1,1,2]))', 'word([1,2,2])[3]', 'length(partition([3,1]))', 'partition([3,1])[1]', 'crossings(matching([[1,4],[2,5],[3,6]]))', 'list(i in 1..3: i)', 'cycles(perm([1,2,3]))']) {
  try { console.log(e, '=>', valueToText(evaluate(e))); } catch (x) { console.log(e, 'ERR', (x as Error).message); }
}
});
