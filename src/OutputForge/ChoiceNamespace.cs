// The typed option values (Choices: the enums the method catalogue names) are read by the spec models, the
// kinds and the analyses alike; they are imported once here, as the Stats areas are in StatsNamespaces.cs.
global using OutputForge.Choices;
