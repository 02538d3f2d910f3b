using System.Runtime.CompilerServices;

[assembly: InternalsVisibleTo("LowVisionAid.Reliability.Tests")]
