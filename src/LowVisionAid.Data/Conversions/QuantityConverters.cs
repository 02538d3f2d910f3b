using LowVisionAid.Optics.Quantities;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace LowVisionAid.Data.Conversions;

// Each optics value type is stored as one REAL in its invariant unit; reading it back goes through the
// type's own factory, so a value outside its range can never enter the app from the database.

/// <summary>Stores a <see cref="Power"/> as dioptres.</summary>
public sealed class PowerConverter() : ValueConverter<Power, double>(p => p.Dioptres, d => Power.FromDioptres(d));

/// <summary>Stores a <see cref="Distance"/> as metres.</summary>
public sealed class DistanceConverter() : ValueConverter<Distance, double>(d => d.Metres, m => Distance.FromMetres(m));

/// <summary>Stores a <see cref="PrintSize"/> as x-height in M units.</summary>
public sealed class PrintSizeConverter() : ValueConverter<PrintSize, double>(p => p.M, m => PrintSize.FromM(m));

/// <summary>Stores an <see cref="Acuity"/> as logMAR.</summary>
public sealed class AcuityConverter() : ValueConverter<Acuity, double>(a => a.LogMar, l => Acuity.FromLogMar(l));

/// <summary>Stores an <see cref="AcuityReserve"/> as its ratio (2 for 2:1).</summary>
public sealed class AcuityReserveConverter() : ValueConverter<AcuityReserve, double>(r => r.Ratio, r => AcuityReserve.FromRatio(r));

/// <summary>Stores a <see cref="VisualAngle"/> as arcminutes.</summary>
public sealed class VisualAngleConverter() : ValueConverter<VisualAngle, double>(a => a.Arcminutes, m => VisualAngle.FromArcminutes(m));
