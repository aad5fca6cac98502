using System.Runtime.CompilerServices;

// The tests compare internal building blocks (the Fisher network, the restricted score estimates)
// with independent computations.
[assembly: InternalsVisibleTo("OutputForge.Stats.Tests")]
