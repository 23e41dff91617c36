using System;
using System.IO;
using System.Text.Json;
using System.Text.Json.Serialization.Metadata;

namespace CompressionMembers.Workflows.Json;

/// <summary>Strict reading of our JSON formats: a size limit on the input, the context's depth limit, unknown fields
/// rejected, no polymorphic type names; failures become <see cref="FormatException"/> naming the line.</summary>
internal static class StrictJson
{
    /// <summary>The default size limit of a JSON input: 64 MiB.</summary>
    internal const long DefaultMaxBytes = 64L * 1024 * 1024;

    internal static T Read<T>(Stream stream, JsonTypeInfo<T> info, long maxBytes, string what) where T : class
    {
        ArgumentNullException.ThrowIfNull(stream);
        byte[] bytes = ReadLimited(stream, maxBytes, what);
        try
        {
            return JsonSerializer.Deserialize(bytes, info)
                ?? throw new FormatException($"The {what} is the JSON literal null; expected an object.");
        }
        catch (JsonException ex)
        {
            string where = ex.LineNumber is { } l ? $" at line {l + 1}, position {ex.BytePositionInLine + 1}" : "";
            throw new FormatException($"The {what} is not valid{where}: {ex.Message}", ex);
        }
    }

    internal static byte[] ReadLimited(Stream stream, long maxBytes, string what)
    {
        using var ms = new MemoryStream();
        var buffer = new byte[81920];
        int read;
        while ((read = stream.Read(buffer, 0, buffer.Length)) > 0)
        {
            if (ms.Length + read > maxBytes)
                throw new FormatException($"The {what} is larger than the limit of {maxBytes} bytes; raise the limit if the file is genuine.");
            ms.Write(buffer, 0, read);
        }
        return ms.ToArray();
    }
}
