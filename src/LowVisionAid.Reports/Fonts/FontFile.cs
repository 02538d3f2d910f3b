using System.Buffers.Binary;
using System.Text;

namespace LowVisionAid.Reports.Fonts;

/// <summary>Reads the few TrueType table fields the reports need (OpenType spec, tables 'head' and 'OS/2').</summary>
internal static class FontFile
{
    /// <summary>
    /// The x-height as a fraction of the em: OS/2 sxHeight ÷ head unitsPerEm (OpenType spec; sxHeight exists from
    /// OS/2 version 2). Returns null when the font does not state it.
    /// </summary>
    public static double? XHeightFraction(ReadOnlySpan<byte> font)
    {
        var head = FindTable(font, "head");
        var os2 = FindTable(font, "OS/2");
        if (head is not { } h || os2 is not { } o || h.Length < 20 || o.Length < 88)
            return null;
        ushort unitsPerEm = BinaryPrimitives.ReadUInt16BigEndian(font.Slice(h.Offset + 18, 2));
        ushort version = BinaryPrimitives.ReadUInt16BigEndian(font.Slice(o.Offset, 2));
        short sxHeight = BinaryPrimitives.ReadInt16BigEndian(font.Slice(o.Offset + 86, 2));
        return version >= 2 && sxHeight > 0 && unitsPerEm > 0 ? (double)sxHeight / unitsPerEm : null;
    }

    /// <summary>
    /// The Basic Multilingual Plane characters the font maps to a glyph, from its cmap format 4 subtable
    /// (OpenType spec, 'cmap'). Empty when the font has none.
    /// </summary>
    public static HashSet<char> MappedCharacters(ReadOnlySpan<byte> font)
    {
        var mapped = new HashSet<char>();
        if (FindTable(font, "cmap") is not { } cmap)
            return mapped;
        int tables = BinaryPrimitives.ReadUInt16BigEndian(font.Slice(cmap.Offset + 2, 2));
        for (int i = 0; i < tables; i++)
        {
            int record = cmap.Offset + 4 + (8 * i);
            int sub = cmap.Offset + checked((int)BinaryPrimitives.ReadUInt32BigEndian(font.Slice(record + 4, 4)));
            if (BinaryPrimitives.ReadUInt16BigEndian(font.Slice(sub, 2)) != 4)
                continue;
            int segments = BinaryPrimitives.ReadUInt16BigEndian(font.Slice(sub + 6, 2)) / 2;
            int ends = sub + 14, starts = ends + (2 * segments) + 2;
            for (int s = 0; s < segments; s++)
            {
                int end = BinaryPrimitives.ReadUInt16BigEndian(font.Slice(ends + (2 * s), 2));
                int start = BinaryPrimitives.ReadUInt16BigEndian(font.Slice(starts + (2 * s), 2));
                for (int c = start; c <= end && c < 0xFFFF; c++)
                    mapped.Add((char)c);
            }
        }

        return mapped;
    }

    private static (int Offset, int Length)? FindTable(ReadOnlySpan<byte> font, string tag)
    {
        if (font.Length < 12)
            return null;
        int count = BinaryPrimitives.ReadUInt16BigEndian(font.Slice(4, 2));
        for (int i = 0; i < count; i++)
        {
            int record = 12 + (16 * i);
            if (record + 16 > font.Length)
                return null;
            if (Encoding.ASCII.GetString(font.Slice(record, 4)) != tag)
                continue;
            int offset = checked((int)BinaryPrimitives.ReadUInt32BigEndian(font.Slice(record + 8, 4)));
            int length = checked((int)BinaryPrimitives.ReadUInt32BigEndian(font.Slice(record + 12, 4)));
            return offset + length <= font.Length ? (offset, length) : null;
        }

        return null;
    }
}
