using System.Runtime.CompilerServices;

// What only the command-line program uses (its commands' entry points: demo, check, compare, shells, changes, and the
// output format names) is internal to the library; the program sees it (the tests do too: Demo/InternalsVisibleToTests).
[assembly: InternalsVisibleTo("outputforge")]
