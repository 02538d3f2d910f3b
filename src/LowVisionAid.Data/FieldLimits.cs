namespace LowVisionAid.Data;

/// <summary>Column lengths; the validators use the same limits so nothing typed is ever cut short.</summary>
public static class FieldLimits
{
    public const int Code = 40;
    public const int Name = 200;
    public const int Measurement = 60;
    public const int Notes = 4000;
}
