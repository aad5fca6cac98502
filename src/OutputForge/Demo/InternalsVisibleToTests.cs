using System.Runtime.CompilerServices;

// The random-number and portable-math building blocks of the demo study are internal; their
// reference-value tests live in the test project.
[assembly: InternalsVisibleTo("OutputForge.Tests")]
