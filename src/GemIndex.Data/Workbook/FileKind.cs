using System.Runtime.InteropServices;

namespace GemIndex.Data.Workbook;

/// <summary>
/// What is at a path before the tool writes there: nothing, a regular file, a folder, a symbolic link, or something
/// else (a device, a pipe, a socket), so a write never replaces anything but a regular file. The link is not followed.
/// </summary>
public static class FileKind
{
    /// <summary>The kinds a path can be.</summary>
    public enum Entry { Missing, RegularFile, Folder, Link, Special }

    /// <summary>The kind of entry at <paramref name="path"/>, its link not followed.</summary>
    public static Entry Of(string path)
    {
        var info = new FileInfo(path);
        if (info.LinkTarget is not null) return Entry.Link;
        if (Directory.Exists(path)) return Entry.Folder;
        if (!info.Exists) return Entry.Missing;
        return IsSpecial(path) ? Entry.Special : Entry.RegularFile;
    }

    /// <summary>A phrase for the entry ("a folder", "a device, pipe or socket") for messages.</summary>
    public static string Describe(Entry kind) => kind switch
    {
        Entry.Missing => "nothing",
        Entry.RegularFile => "a file",
        Entry.Folder => "a folder",
        Entry.Link => "a symbolic link",
        _ => "a device, pipe or socket",
    };

    // .NET has no public file-type query, and FileAttributes calls a device "Normal". statx(2) on Linux has one
    // struct layout on every architecture (stx_mode is the 16 bits at offset 28); elsewhere a 0-byte entry that is
    // not a folder is taken as special, which errs on the side of not writing.
    private static bool IsSpecial(string path)
    {
        if (OperatingSystem.IsLinux())
        {
            var buffer = new byte[256];
            if (statx(AtCurrentFolder, path, AtSymlinkNoFollow, StatxType, buffer) == 0)
            {
                int mode = BitConverter.ToUInt16(buffer, 28);
                return (mode & FileTypeMask) != RegularFileType;
            }
        }
        return new FileInfo(path).Length == 0;
    }

    private const int AtCurrentFolder = -100, AtSymlinkNoFollow = 0x100, FileTypeMask = 0xF000, RegularFileType = 0x8000;
    private const uint StatxType = 1;

#pragma warning disable SYSLIB1054 // a plain DllImport: one call, blittable but for the path string
    [DllImport("libc", SetLastError = true, CharSet = CharSet.Ansi, BestFitMapping = false, ThrowOnUnmappableChar = true)]
    private static extern int statx(int directoryFd, string path, int flags, uint mask, byte[] buffer);
#pragma warning restore SYSLIB1054
}
